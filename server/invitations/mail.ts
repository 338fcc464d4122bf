import type { Role } from '@/shared/api/groups';
import type { OutgoingMail } from '../mail/mailer';

export function invitationMail(p: {
  to: string;
  groupName: string;
  inviter: string;
  role: Role;
  link: string;
  expiresAt: Date;
}): OutgoingMail {
  return {
    to: p.to,
    subject: `${p.inviter} invited you to ${p.groupName} on Overstrand`,
    text: [
      `${p.inviter} invited you to join the group "${p.groupName}" on Overstrand as ${p.role}.`,
      '',
      `Open this link to accept (sign in or create an account first):`,
      p.link,
      '',
      `The link works once and expires on ${p.expiresAt.toUTCString()}.`,
      'If you did not expect this, ignore this message.',
    ].join('\n'),
  };
}
