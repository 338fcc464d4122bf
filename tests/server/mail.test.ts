import { createSmtpMailer } from '@/server/mail/mailer';
import { startSmtpFake, type Mailbox } from '@/server/mail/smtp-fake';

// The mail module on its own, as later areas (finished runs, notifications) will use it.
let mailbox: Mailbox;
beforeAll(async () => {
  mailbox = await startSmtpFake();
});
afterAll(() => mailbox.stop());

describe('Mailer over SMTP into the fake', () => {
  it('keeps each message with sender, recipient, subject, text and its links', async () => {
    const mailer = createSmtpMailer({ host: mailbox.host, port: mailbox.port }, 'Overstrand <robot@overstrand.invalid>');
    await mailer.send({
      to: 'ann@example.org',
      subject: 'Your run finished — Khovanov homology of 8_19',
      text: 'Results: http://localhost:8080/runs/42 and the table at https://example.org/t?x=1&y=2.\nBye',
    });
    // sendMail resolves after the fake accepted and parsed the message.
    const [kept] = mailbox.list();
    expect(kept).toEqual({
      id: expect.any(String),
      from: 'robot@overstrand.invalid',
      to: ['ann@example.org'],
      subject: 'Your run finished — Khovanov homology of 8_19',
      text: expect.stringContaining('Results:'),
      date: expect.any(String),
      links: ['http://localhost:8080/runs/42', 'https://example.org/t?x=1&y=2'],
    });
  });

  it('keeps messages in order and list() is a copy', async () => {
    const mailer = createSmtpMailer({ host: mailbox.host, port: mailbox.port }, 'x@overstrand.invalid');
    const before = mailbox.list().length;
    await mailer.send({ to: 'a@example.org', subject: 'one', text: '1' });
    await mailer.send({ to: 'b@example.org', subject: 'two', text: '2' });
    const list = mailbox.list();
    expect(list.slice(before).map((m) => m.subject)).toEqual(['one', 'two']);
    list.pop();
    expect(mailbox.list()).toHaveLength(before + 2);
  });
});
