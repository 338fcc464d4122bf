// What each role may do in a group, as pure predicates shared by the server (which enforces
// them, server/groups/permissions.ts) and the app (which only offers what would be allowed).
// The one rule not here needs the group's state: a group always keeps at least one owner.
import { roles, type Role } from './groups';

/** Owners and admins manage members and invitations. */
export const canManage = (actor: Role): boolean => actor === 'owner' || actor === 'admin';

/** Roles `actor` may give, by invitation or by a role change: admins never make owners. */
export function assignableRoles(actor: Role): readonly Role[] {
  if (actor === 'owner') return roles;
  if (actor === 'admin') return roles.filter((r) => r !== 'owner');
  return [];
}

/** Whether `actor` may change the role of, or remove, another member whose role is `target`. */
export const canEditMember = (actor: Role, target: Role): boolean =>
  actor === 'owner' || (actor === 'admin' && target !== 'owner');
