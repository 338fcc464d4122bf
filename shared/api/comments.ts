// Comments on a shared sketch: plain text with simple formatting (**bold**, *italic*, `code`,
// line breaks), stored as typed and rendered by the app as text nodes, never as HTML.
import { z } from 'zod';

export const commentPaths = {
  comments: (sketchId: string) => `/api/sketches/${sketchId}/comments`, // GET list, POST add
  comment: (commentId: string) => `/api/comments/${commentId}`, // PATCH edit own, DELETE own (admins: any)
} as const;

export const CommentBody = z
  .string({ message: 'Write something first' })
  .trim()
  .min(1, 'Write something first')
  .max(5_000, 'A comment is at most 5000 characters');

export const CommentRequest = z.object({ body: CommentBody });
export type CommentRequest = z.infer<typeof CommentRequest>;
/**
 * A new comment may carry an id made on the device (sync/SPEC.md S34), so a retried post is
 * answered with the comment it already made (200) instead of a second one (201).
 */
export const NewCommentRequest = CommentRequest.extend({ id: z.uuid({ message: 'Comment id must be a UUID' }).optional() });
export type NewCommentRequest = z.infer<typeof NewCommentRequest>;

export const Comment = z.object({
  id: z.string(),
  sketchId: z.string(),
  author: z.object({ id: z.string(), displayName: z.string() }),
  body: z.string(),
  createdAt: z.string(),
  editedAt: z.string().nullable(),
});
export type Comment = z.infer<typeof Comment>;
export const CommentList = z.array(Comment);
