// In-app notifications and their e-mail twins, with a per-user setting for each kind.
import { z } from 'zod';

export const notificationPaths = {
  list: '/api/notifications', // GET newest first (?unread=true)
  read: (id: string) => `/api/notifications/${id}/read`, // POST mark one read
  readAll: '/api/notifications/read', // POST mark all read
  settings: '/api/me/settings', // GET / PUT
} as const;

export const notificationKinds = ['comment', 'run_finished', 'invitation_accepted'] as const;
export const NotificationKind = z.enum(notificationKinds);
export type NotificationKind = z.infer<typeof NotificationKind>;

/** What each kind carries; the app builds its sentence and link from it. */
export const notificationPayloads = {
  comment: z.object({ groupId: z.string(), sketchId: z.string(), sketchTitle: z.string(), commentId: z.string(), author: z.string(), excerpt: z.string() }),
  run_finished: z.object({
    runId: z.string(),
    sketchId: z.string(),
    sketchTitle: z.string(),
    status: z.enum(['succeeded', 'failed', 'cancelled']),
    /** One short line for the app's list. */
    summary: z.string().max(500),
    /** What ran, for the mail's subject: "Khovanov homology over Z, reduced" (older notifications have none). */
    what: z.string().max(200).optional(),
    /** The mail's body lines: the full input, the Poincare polynomial, the torsion. */
    details: z.array(z.string().max(4000)).max(10).optional(),
  }),
  invitation_accepted: z.object({ groupId: z.string(), groupName: z.string(), who: z.string(), role: z.string() }),
} as const;
export type NotificationPayload<K extends NotificationKind> = z.infer<(typeof notificationPayloads)[K]>;

export const Notification = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('comment'), payload: notificationPayloads.comment }),
  z.object({ kind: z.literal('run_finished'), payload: notificationPayloads.run_finished }),
  z.object({ kind: z.literal('invitation_accepted'), payload: notificationPayloads.invitation_accepted }),
]).and(z.object({ id: z.string(), createdAt: z.string(), readAt: z.string().nullable() }));
export type Notification = z.infer<typeof Notification>;
export const NotificationList = z.object({ items: z.array(Notification), unread: z.int() });
export type NotificationList = z.infer<typeof NotificationList>;
export const NotificationListQuery = z.object({ unread: z.enum(['true', 'false']).optional() });

/** Per kind: whether it is also sent by e-mail. In-app notifications are always kept. */
export const UserSettings = z.object({
  email: z.object({ comment: z.boolean(), run_finished: z.boolean(), invitation_accepted: z.boolean() }),
});
export type UserSettings = z.infer<typeof UserSettings>;
export const defaultUserSettings = (): UserSettings => ({ email: { comment: true, run_finished: true, invitation_accepted: true } });
