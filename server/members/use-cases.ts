// The members page (owners and admins): the roster with joined and last-active times, and
// resending a pending invitation. Role changes, removal and withdrawing invitations are the
// groups and invitations areas' routes.
import type { User } from '@/shared/api/auth';
import type { Invitation } from '@/shared/api/groups';
import type { RosterEntry } from '@/shared/api/members';
import { canManage } from '@/shared/api/roles';
import { inTransaction } from '../db/transaction';
import type { Deps } from '../deps';
import { noSuchGroup, requireMember } from '../groups/access';
import { findGroup } from '../groups/repository';
import { AppError, forbidden, notFound } from '../http/errors';
import { invitationMail } from '../invitations/mail';
import { findInGroup } from '../invitations/repository';
import { hashToken, newToken } from '../invitations/token';
import { invitePagePath } from '@/shared/api/groups';
import * as repo from './repository';

export async function roster(deps: Deps, caller: User, groupId: string): Promise<RosterEntry[]> {
  if (!canManage(await requireMember(deps.db, groupId, caller.id))) throw forbidden('Only owners and admins can open the members page');
  return (await repo.rosterOf(deps.db, groupId)).map(({ m, lastActiveAt }) => ({
    userId: m.userId,
    displayName: m.user!.displayName,
    email: m.user!.email,
    role: m.role,
    joinedAt: m.createdAt.toISOString(),
    lastActiveAt: lastActiveAt?.toISOString() ?? null,
  }));
}

export async function resend(deps: Deps, caller: User, groupId: string, invitationId: string): Promise<Invitation> {
  if (!canManage(await requireMember(deps.db, groupId, caller.id))) throw forbidden('Only owners and admins can resend invitations');
  const group = await findGroup(deps.db, groupId);
  if (!group) throw noSuchGroup();
  const i = await findInGroup(deps.db, groupId, invitationId);
  if (!i) throw notFound('No such invitation in this group');
  if (i.acceptedAt) throw new AppError('invitation_used', 409, 'This invitation was already accepted');
  const token = newToken();
  const expiresAt = new Date(deps.now().getTime() + deps.config.invitationTtlMs);
  const link = `${deps.config.publicUrl}${invitePagePath(token)}`;
  // Mail first: if it fails, the old link still works and nothing changed.
  try {
    await deps.mailer.send(invitationMail({ to: i.email, groupName: group.name, inviter: caller.displayName, role: i.role, link, expiresAt }));
  } catch (err) {
    deps.log.error({ err }, 'invitation resend mail failed');
    throw new AppError('mail_failed', 502, 'The invitation e-mail could not be sent; try again later');
  }
  await inTransaction(deps.db, (m) => repo.renewInvitation(m, i.id, hashToken(token), expiresAt));
  return { id: i.id, groupId, email: i.email, role: i.role, expiresAt: expiresAt.toISOString(), createdAt: i.createdAt.toISOString() };
}
