import { randomUUID } from 'node:crypto';
import type { User } from '@/shared/api/auth';
import {
  invitePagePath,
  type CreateInvitationRequest,
  type GroupSummary,
  type Invitation as InvitationDto,
  type InvitationPreview,
  type InvitationStatus,
} from '@/shared/api/groups';
import type { Invitation } from '../db/entities';
import { inTransaction } from '../db/transaction';
import type { Deps } from '../deps';
import { findUserByEmail } from '../auth/repository';
import { noSuchGroup, requireMember } from '../groups/access';
import { checkInvite, checkManageInvitations } from '../groups/permissions';
import { addMembership, findGroup, findMembership } from '../groups/repository';
import { AppError, notFound } from '../http/errors';
import { notify } from '../notifications/use-cases';
import { invitationMail } from './mail';
import * as repo from './repository';
import { hashToken, newToken } from './token';

const toDto = (i: Invitation): InvitationDto => ({
  id: i.id,
  groupId: i.groupId,
  email: i.email,
  role: i.role,
  expiresAt: i.expiresAt.toISOString(),
  createdAt: i.createdAt.toISOString(),
});

const statusOf = (i: Invitation, now: Date): InvitationStatus =>
  i.acceptedAt ? 'accepted' : i.expiresAt <= now ? 'expired' : 'pending';

const alreadyMember = () => new AppError('already_member', 409, 'That person is already a member of this group');

export async function invite(deps: Deps, caller: User, groupId: string, input: CreateInvitationRequest): Promise<InvitationDto> {
  const { db, config, now } = deps;
  const actor = await requireMember(db, groupId, caller.id);
  checkInvite(actor, input.role);
  const group = await findGroup(db, groupId);
  if (!group) throw noSuchGroup();
  const invitee = await findUserByEmail(db, input.email);
  if (invitee && (await findMembership(db, groupId, invitee.id))) throw alreadyMember();

  const token = newToken();
  const createdAt = now();
  const expiresAt = new Date(createdAt.getTime() + config.invitationTtlMs);
  const row = await repo.insertInvitation(db, {
    id: randomUUID(),
    groupId,
    email: input.email,
    role: input.role,
    tokenHash: hashToken(token),
    invitedById: caller.id,
    expiresAt,
    createdAt,
  });
  const link = `${config.publicUrl}${invitePagePath(token)}`;
  try {
    await deps.mailer.send(invitationMail({ to: input.email, groupName: group.name, inviter: caller.displayName, role: input.role, link, expiresAt }));
  } catch (err) {
    // An invitation nobody received is useless: undo it so a retry starts clean.
    deps.log.error({ err }, 'invitation mail failed');
    await repo.deleteInvitation(db, row.id);
    throw new AppError('mail_failed', 502, 'The invitation e-mail could not be sent; try again later');
  }
  return toDto(row);
}

export async function listInvitations({ db, now }: Deps, caller: User, groupId: string): Promise<InvitationDto[]> {
  checkManageInvitations(await requireMember(db, groupId, caller.id));
  const at = now();
  return (await repo.unaccepted(db, groupId)).filter((i) => statusOf(i, at) === 'pending').map(toDto);
}

/** Withdraws an invitation that has not been accepted yet; its link then answers 404. */
export async function revoke({ db }: Deps, caller: User, groupId: string, invitationId: string): Promise<void> {
  checkManageInvitations(await requireMember(db, groupId, caller.id));
  const i = await repo.findInGroup(db, groupId, invitationId);
  if (!i) throw notFound('No such invitation in this group');
  if (i.acceptedAt) throw new AppError('invitation_used', 409, 'This invitation was already accepted; remove the member instead');
  await repo.deleteInvitation(db, i.id);
}

const noSuchInvitation = () => notFound('This invitation link is not valid; ask for a new one');

export async function preview({ db, now }: Deps, token: string): Promise<InvitationPreview> {
  const i = await repo.findByTokenHash(db, hashToken(token));
  if (!i) throw noSuchInvitation();
  return {
    groupName: i.group!.name,
    role: i.role,
    email: i.email,
    invitedBy: i.invitedBy!.displayName,
    expiresAt: i.expiresAt.toISOString(),
    status: statusOf(i, now()),
  };
}

export async function accept(deps: Deps, caller: User, token: string): Promise<GroupSummary> {
  const { db, now } = deps;
  const { joined, invitedById } = await inTransaction(db, async (m) => {
    const i = await repo.findByTokenHash(m, hashToken(token));
    if (!i) throw noSuchInvitation();
    const at = now();
    const status = statusOf(i, at);
    if (status === 'accepted') throw new AppError('invitation_used', 409, 'This invitation link has already been used');
    if (status === 'expired') throw new AppError('invitation_expired', 410, 'This invitation link has expired; ask for a new one');
    if (await findMembership(m, i.groupId, caller.id)) throw alreadyMember();
    await addMembership(m, i.groupId, caller.id, i.role);
    await repo.markAccepted(m, i.id, caller.id, at);
    return { joined: { id: i.groupId, name: i.group!.name, role: i.role } satisfies GroupSummary, invitedById: i.invitedById };
  });
  await notify(deps, invitedById, 'invitation_accepted', { groupId: joined.id, groupName: joined.name, who: caller.displayName, role: joined.role });
  return joined;
}
