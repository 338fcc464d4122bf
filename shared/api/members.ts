// The members page of a group (owners and admins): the roster with joined and last-active
// times, and resending a pending invitation (a new link; the old one stops working).
import { z } from 'zod';
import { Member } from './groups';

export const memberPaths = {
  roster: (groupId: string) => `/api/groups/${groupId}/roster`, // GET (owner/admin)
  resend: (groupId: string, invitationId: string) => `/api/groups/${groupId}/invitations/${invitationId}/resend`, // POST -> 200 Invitation
} as const;

export const RosterEntry = Member.extend({
  joinedAt: z.string(),
  /** Last signed-in request, to the minute; null if never seen since tracking began. */
  lastActiveAt: z.string().nullable(),
});
export type RosterEntry = z.infer<typeof RosterEntry>;
export const Roster = z.array(RosterEntry);

