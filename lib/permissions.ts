// What the UI offers each role, mirroring the server's rules (shared/api/groups.ts header): owners
// and admins manage members and invite; an admin can neither touch an owner nor make one. The
// server enforces the same rules; the UI only hides what would be refused.
import { roles, type Role } from '@/shared/api/groups';

export function canManage(role: Role): boolean {
  return role === 'owner' || role === 'admin';
}

/** Roles `actor` may give, by invitation or by a role change. */
export function assignableRoles(actor: Role): readonly Role[] {
  if (actor === 'owner') return roles;
  if (actor === 'admin') return roles.filter((r) => r !== 'owner');
  return [];
}

/** Whether `actor` may change the role of, or remove, a member whose role is `target`. */
export function canEditMember(actor: Role, target: Role): boolean {
  return actor === 'owner' || (actor === 'admin' && target !== 'owner');
}

export const roleDescriptions: Record<Role, string> = {
  owner: 'Manages the group, its members and owners',
  admin: 'Invites people and manages members',
  member: 'Shares sketches, comments and starts runs',
  viewer: 'Reads the feed and results only',
};
