// Query key factories of the account and its groups. Other resources keep their factory beside
// their hooks (feedKeys, runKeys, localKeys, notificationKeys); every cached answer has one.
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
