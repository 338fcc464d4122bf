// Comments on a shared sketch. Readable by every member of the sketch's group; members and up
// write; authors edit and delete their own; owners and admins remove anyone's.
import { randomUUID } from 'node:crypto';
import type { User } from '@/shared/api/auth';
import type { Comment as CommentDto } from '@/shared/api/comments';
import { canModerate, canPost } from '@/shared/api/feed-rules';
import type { Comment } from '../db/entities';
import { inTransaction } from '../db/transaction';
import type { Deps } from '../deps';
import { sharedSketchAccess } from '../feed/access';
import { usersById } from '../feed/repository';
import { AppError, forbidden, notFound } from '../http/errors';
import { notify } from '../notifications/use-cases';
import * as repo from './repository';

export async function toDtos(deps: Deps, rows: Comment[]): Promise<CommentDto[]> {
  const users = await usersById(deps.db, rows.map((c) => c.authorId));
  return rows.map((c) => ({
    id: c.id,
    sketchId: c.sketchId,
    author: { id: c.authorId, displayName: users.get(c.authorId)?.displayName ?? 'Former member' },
    body: c.body,
    createdAt: c.createdAt.toISOString(),
    editedAt: c.editedAt?.toISOString() ?? null,
  }));
}

export async function list(deps: Deps, caller: User, sketchId: string): Promise<CommentDto[]> {
  const { sketch } = await sharedSketchAccess(deps.db, caller.id, sketchId);
  return toDtos(deps, await repo.commentsOn(deps.db, sketch.id, sketch.groupId));
}

const excerpt = (body: string) => (body.length > 280 ? `${body.slice(0, 277)}...` : body);

/**
 * S34: `id` made on the device makes a retry harmless: the same id from the same author on the
 * same sketch answers the comment already made (created: false); anyone or anything else, 409.
 */
export async function add(deps: Deps, caller: User, sketchId: string, body: string, id: string = randomUUID()): Promise<{ comment: CommentDto; created: boolean }> {
  const { sketch, role } = await sharedSketchAccess(deps.db, caller.id, sketchId);
  if (!canPost(role)) throw forbidden('Viewers can read the discussion but not comment');
  const fresh: Comment = { id, sketchId, groupId: sketch.groupId, authorId: caller.id, body, createdAt: deps.now(), editedAt: null };
  const row = await inTransaction(deps.db, async (m) => (await repo.findComment(m, id)) ?? (await repo.insertComment(m, fresh), fresh));
  if (row !== fresh) {
    if (row.authorId !== caller.id || row.sketchId !== sketchId) throw new AppError('id_taken', 409, 'That comment id is already used by another comment');
    return { comment: (await toDtos(deps, [row]))[0], created: false };
  }
  if (sketch.ownerId !== caller.id) {
    await notify(deps, sketch.ownerId, 'comment', {
      groupId: sketch.groupId,
      sketchId,
      sketchTitle: sketch.title,
      commentId: row.id,
      author: caller.displayName,
      excerpt: excerpt(body),
    });
  }
  return { comment: (await toDtos(deps, [row]))[0], created: true };
}

/** The comment and the caller's role, when the comment's sketch is still shared where it was written. */
async function commentAccess(deps: Deps, caller: User, commentId: string) {
  const gone = () => notFound('No such comment');
  const c = await repo.findComment(deps.db, commentId);
  if (!c) throw gone();
  const { sketch, role } = await sharedSketchAccess(deps.db, caller.id, c.sketchId).catch(() => {
    throw gone();
  });
  if (sketch.groupId !== c.groupId) throw gone();
  return { c, role };
}

export async function edit(deps: Deps, caller: User, commentId: string, body: string): Promise<CommentDto> {
  const { c, role } = await commentAccess(deps, caller, commentId);
  if (c.authorId !== caller.id) throw forbidden('Only the author can edit a comment');
  if (!canPost(role)) throw forbidden('Viewers cannot edit comments');
  const editedAt = deps.now();
  await inTransaction(deps.db, (m) => repo.updateBody(m, c.id, body, editedAt));
  return (await toDtos(deps, [{ ...c, body, editedAt }]))[0];
}

export async function remove(deps: Deps, caller: User, commentId: string): Promise<void> {
  const { c, role } = await commentAccess(deps, caller, commentId);
  if (c.authorId !== caller.id && !canModerate(role)) throw forbidden("Only the author, an admin or an owner can remove a comment");
  await inTransaction(deps.db, (m) => repo.deleteComment(m, c.id));
}
