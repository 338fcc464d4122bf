// The e-mail twin of each notification kind: a subject and a short text with a link back.
import katex from 'katex';
import type { NotificationKind, NotificationPayload } from '@/shared/api/notifications';
import { runPagePath } from '@/shared/api/runs';
import { commentMarkdown, commentPlainText } from '@/shared/text/comment-markdown';
import type { OutgoingMail } from '../mail/mailer';

// Comments in the HTML part as the app shows them; maths as MathML, which needs no style sheet.
const md = commentMarkdown();
md.renderer.rules.math_inline = (tokens, i) => katex.renderToString(tokens[i].content, { output: 'mathml', throwOnError: false });
const escape = (s: string) => s.replace(/[&<>"]/g, (c) => `&${({ '&': 'amp', '<': 'lt', '>': 'gt', '"': 'quot' } as Record<string, string>)[c]};`);

/** A line is plain words, or a comment's Markdown (its plain words in the text part, rendered in the HTML). */
type Line = string | { markdown: string };
type Text = { subject: string; lines: Line[] };
type Texts = { [K in NotificationKind]: (p: NotificationPayload<K>, base: string) => Text };

const texts: Texts = {
  comment: (p, base) => ({
    subject: `${p.author} commented on "${p.sketchTitle || 'Untitled sketch'}"`,
    lines: [`${p.author} wrote:`, '', { markdown: p.excerpt }, '', `Open the sketch: ${base}/feed/${p.groupId}/${p.sketchId}`],
  }),
  run_finished: (p, base) => ({
    subject: `Run ${p.status}: "${p.sketchTitle || 'Untitled sketch'}"${p.what ? `, ${p.what}` : ''}`,
    lines: [`Your run on "${p.sketchTitle || 'Untitled sketch'}" ${p.status}.`, '', ...(p.details ?? [p.summary]), '', `Open the result: ${base}${runPagePath(p.runId)}`],
  }),
  invitation_accepted: (p, base) => ({
    subject: `${p.who} joined ${p.groupName}`,
    lines: [`${p.who} accepted your invitation and joined "${p.groupName}" as ${p.role}.`, '', `Members: ${base}/account/groups/${p.groupId}`],
  }),
};

/** Several notifications in one e-mail: each one's subject and link, newest last. */
const FOOTER = 'You get these e-mails because of your Overstrand notification settings (Account > Notifications).';

export function digestMail(to: string, items: { kind: NotificationKind; payload: NotificationPayload<NotificationKind> }[], base: string): OutgoingMail {
  const entries = items.map(({ kind, payload }) => {
    const { subject, lines } = (texts[kind] as (p: unknown, b: string) => Text)(payload, base);
    return `- ${subject}\n  ${lines[lines.length - 1]}`;
  });
  const text = [`${items.length} notifications in the last few minutes:`, '', ...entries, '', `All of them: ${base}/account/notifications`, '', FOOTER].join('\n');
  return { to, subject: `${items.length} new notifications on Overstrand`, text };
}

export function notificationMail<K extends NotificationKind>(to: string, kind: K, payload: NotificationPayload<K>, base: string): OutgoingMail {
  const { subject, lines } = (texts[kind] as (p: NotificationPayload<K>, b: string) => Text)(payload, base);
  const all = [...lines, '', FOOTER];
  const text = all.map((l) => (typeof l === 'string' ? l : commentPlainText(l.markdown))).join('\n');
  if (all.every((l) => typeof l === 'string')) return { to, subject, text };
  return { to, subject, text, html: all.map((l) => (typeof l !== 'string' ? md.render(l.markdown) : l ? `<p>${escape(l)}</p>` : '')).join('\n') };
}
