import { randomUUID } from 'node:crypto';
import type { User } from '@/shared/api/auth';
import type { CreateGroupRequest, GroupSummary, Member, Role } from '@/shared/api/groups';
import { inTransaction } from '../db/transaction';
import type { Deps } from '../deps';
import { notFound } from '../http/errors';
import { noSuchGroup, requireMember } from './access';
import { checkChangeRole, checkRemove } from './permissions';
import * as repo from './repository';

export async function createGroup({ db }: Deps, caller: User, input: CreateGroupRequest): Promise<GroupSummary> {
  const id = randomUUID();
  await inTransaction(db, (m) => repo.insertGroup(m, id, input.name, caller.id));
  return { id, name: input.name, role: 'owner' };
}

export const listMyGroups = ({ db }: Deps, caller: User) => repo.groupsOf(db, caller.id);

export async function getGroup({ db }: Deps, caller: User, groupId: string): Promise<GroupSummary> {
  const role = await requireMember(db, groupId, caller.id);
  const group = await repo.findGroup(db, groupId);
  if (!group) throw noSuchGroup();
  return { id: group.id, name: group.name, role };
}

export async function listMembers({ db }: Deps, caller: User, groupId: string): Promise<Member[]> {
  await requireMember(db, groupId, caller.id);
  return repo.membersOf(db, groupId);
}

const noSuchMember = () => notFound('That user is not a member of this group');

export function changeRole({ db }: Deps, caller: User, groupId: string, userId: string, role: Role): Promise<Member> {
  return inTransaction(db, async (m) => {
    const actor = await requireMember(m, groupId, caller.id);
    const target = await repo.findMembership(m, groupId, userId);
    if (!target) throw noSuchMember();
    checkChangeRole(actor, target.role, role, await repo.countOwners(m, groupId));
    await repo.setRole(m, groupId, userId, role);
    return (await repo.memberOf(m, groupId, userId))!;
  });
}

/** Removes a member; with the caller's own id this is leaving the group. */
export function removeMember({ db }: Deps, caller: User, groupId: string, userId: string): Promise<void> {
  return inTransaction(db, async (m) => {
    const actor = await requireMember(m, groupId, caller.id);
    const target = await repo.findMembership(m, groupId, userId);
    if (!target) throw noSuchMember();
    checkRemove(actor, target.role, userId === caller.id, await repo.countOwners(m, groupId));
    await repo.deleteMembership(m, groupId, userId);
  });
}
