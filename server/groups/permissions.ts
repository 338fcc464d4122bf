// The role rules of shared/api/roles.ts, enforced: each check throws the error the client sees.
// Non-members never reach these checks (they get 404 earlier, see access.ts).
import type { Role } from '@/shared/api/groups';
import { assignableRoles, canEditMember, canManage } from '@/shared/api/roles';
import { AppError, forbidden } from '../http/errors';

const lastOwner = (what: string) =>
  new AppError('last_owner', 409, `${what}: the group must keep at least one owner; make someone else owner first`);

export function checkInvite(actor: Role, role: Role): void {
  if (!canManage(actor)) throw forbidden('Only owners and admins can invite people');
  if (!assignableRoles(actor).includes(role)) throw forbidden('Only owners can invite owners');
}

export function checkManageInvitations(actor: Role): void {
  if (!canManage(actor)) throw forbidden('Only owners and admins can see or withdraw invitations');
}

export function checkChangeRole(actor: Role, target: Role, next: Role, owners: number): void {
  if (!canManage(actor)) throw forbidden('Only owners and admins can change roles');
  if (!canEditMember(actor, target) || !assignableRoles(actor).includes(next)) {
    throw forbidden('Only owners can change an owner or make someone owner');
  }
  if (target === 'owner' && next !== 'owner' && owners <= 1) throw lastOwner('Cannot demote the last owner');
}

/** Removing yourself is leaving: allowed for every role except the last owner. */
export function checkRemove(actor: Role, target: Role, self: boolean, owners: number): void {
  if (self) {
    if (target === 'owner' && owners <= 1) throw lastOwner('The last owner cannot leave');
    return;
  }
  if (!canManage(actor)) throw forbidden('Only owners and admins can remove members');
  if (!canEditMember(actor, target)) throw forbidden('Only owners can remove an owner');
}
