// The e-mail twin of each notification kind: a subject and a short text with a link back.
import type { NotificationKind, NotificationPayload } from '@/shared/api/notifications';
import type { OutgoingMail } from '../mail/mailer';

type Texts = { [K in NotificationKind]: (p: NotificationPayload<K>, base: string) => { subject: string; lines: string[] } };

const texts: Texts = {
  comment: (p, base) => ({
    subject: `${p.author} commented on "${p.sketchTitle || 'Untitled sketch'}"`,
    lines: [`${p.author} wrote:`, '', p.excerpt, '', `Open the sketch: ${base}/feed/${p.groupId}/${p.sketchId}`],
  }),
  run_finished: (p, base) => ({
    subject: `Run ${p.status} on "${p.sketchTitle || 'Untitled sketch'}"`,
    lines: [`Your run on "${p.sketchTitle || 'Untitled sketch'}" ${p.status}.`, '', p.summary, '', `Open the result: ${base}/runs/${p.runId}`],
  }),
  invitation_accepted: (p, base) => ({
    subject: `${p.who} joined ${p.groupName}`,
    lines: [`${p.who} accepted your invitation and joined "${p.groupName}" as ${p.role}.`, '', `Members: ${base}/account/groups/${p.groupId}`],
  }),
};

export function notificationMail<K extends NotificationKind>(to: string, kind: K, payload: NotificationPayload<K>, base: string): OutgoingMail {
  const { subject, lines } = (texts[kind] as (p: NotificationPayload<K>, b: string) => { subject: string; lines: string[] })(payload, base);
  return {
    to,
    subject,
    text: [...lines, '', 'You get these e-mails because of your Overstrand notification settings (Account > Notifications).'].join('\n'),
  };
}
