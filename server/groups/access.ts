// The gate every group-scoped route passes first: a non-member learns nothing, not even that
// the group exists (404). Later areas (feed, sketches shared to a group, runs) use it too.
import type { DataSource, EntityManager } from 'typeorm';
import type { Role } from '@/shared/api/groups';
import { notFound } from '../http/errors';
import { findMembership } from './repository';

export const noSuchGroup = () => notFound('No such group, or you are not a member of it');

/** The caller's role in the group; 404 when the caller is not a member. */
export async function requireMember(db: DataSource | EntityManager, groupId: string, userId: string): Promise<Role> {
  const membership = await findMembership(db, groupId, userId);
  if (!membership) throw noSuchGroup();
  return membership.role;
}
