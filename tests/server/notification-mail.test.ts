// The comment e-mail carries the comment as the app shows it: plain words in the text part,
// Markdown rendered (maths as MathML) in the HTML part, and nothing typed becomes markup.
import { notificationMail } from '@/server/notifications/mail';

const payload = (excerpt: string) => ({ sketchId: 's1', groupId: 'g1', sketchTitle: 'Hopf link', commentId: 'c1', author: 'Ada', excerpt });

test('text part: the words without Markdown markers; HTML part: rendered, maths as MathML', () => {
  const mail = notificationMail('a@example.com', 'comment', payload('Is **this** *really* $\\mathrm{lk} = \\pm 1$?'), 'http://x');
  expect(mail.text).toContain('Is this really \\mathrm{lk} = \\pm 1?');
  expect(mail.text).not.toMatch(/\*\*|\$/);
  expect(mail.html).toContain('<strong>this</strong>');
  expect(mail.html).toContain('<em>really</em>');
  expect(mail.html).toMatch(/<math[^>]*>.*<mi mathvariant="normal">l<\/mi>/s);
  expect(mail.html).toContain('http://x/feed/g1/s1');
});

test('HTML typed into a comment arrives escaped, and a javascript: link is no link', () => {
  const mail = notificationMail('a@example.com', 'comment', payload('<img src=x onerror=alert(1)> [go](javascript:alert(1))'), 'http://x');
  expect(mail.html).toContain('&lt;img src=x onerror=alert(1)&gt;');
  expect(mail.html).not.toContain('<img');
  expect(mail.html).not.toContain('href="javascript');
});

test('a kind without a comment is text only', () => {
  const mail = notificationMail('a@example.com', 'invitation_accepted', { who: 'Ada', groupName: 'Knots', role: 'member', groupId: 'g1' }, 'http://x');
  expect(mail.html).toBeUndefined();
});
