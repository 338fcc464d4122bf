// Query key factories: every cached server answer is named here, so invalidation is exact.
export const keys = {
  me: () => ['me'] as const,
  groups: {
    all: () => ['groups'] as const,
    list: () => [...keys.groups.all(), 'list'] as const,
    detail: (id: string) => [...keys.groups.all(), 'detail', id] as const,
    members: (id: string) => [...keys.groups.detail(id), 'members'] as const,
    invitations: (id: string) => [...keys.groups.detail(id), 'invitations'] as const,
  },
  invitation: (token: string) => ['invitation', token] as const,
};
