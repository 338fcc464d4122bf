// Groups, memberships, roles and invitations. Roles, strongest first: owner > admin > member >
// viewer. Owners and admins manage members and invite; an admin cannot touch an owner nor
// make or invite one; a group always keeps at least one owner.
import { z } from 'zod';
import { Email } from './auth';

export const roles = ['owner', 'admin', 'member', 'viewer'] as const;
export const Role = z.enum(roles, { message: 'Role must be owner, admin, member or viewer' });
export type Role = z.infer<typeof Role>;

export const groupPaths = {
  groups: '/api/groups', // GET list mine, POST create
  group: (id: string) => `/api/groups/${id}`, // GET one (members only)
  members: (id: string) => `/api/groups/${id}/members`, // GET
  member: (id: string, userId: string) => `/api/groups/${id}/members/${userId}`, // PATCH role, DELETE remove
  leave: (id: string) => `/api/groups/${id}/leave`, // POST
  invitations: (id: string) => `/api/groups/${id}/invitations`, // GET pending, POST invite
  pendingInvitation: (id: string, invitationId: string) => `/api/groups/${id}/invitations/${invitationId}`, // DELETE revoke (204)
  invitation: (token: string) => `/api/invitations/${token}`, // GET preview (no sign-in needed)
  accept: (token: string) => `/api/invitations/${token}/accept`, // POST (signed in)
} as const;

/** The path the invitation e-mail links to, under PUBLIC_URL: `${PUBLIC_URL}/invite/<token>`. */
export const invitePagePath = (token: string) => `/invite/${token}`;

export const GroupName = z
  .string({ message: 'Group name is required' })
  .trim()
  .min(1, 'Group name is required')
  .max(100, 'Group name must be at most 100 characters');

export const CreateGroupRequest = z.object({ name: GroupName });
export type CreateGroupRequest = z.infer<typeof CreateGroupRequest>;

/** POST /api/groups (201), each item of GET /api/groups, GET /api/groups/:id. */
export const GroupSummary = z.object({
  id: z.string(),
  name: z.string(),
  role: Role, // the caller's role in this group
});
export type GroupSummary = z.infer<typeof GroupSummary>;
export const GroupList = z.array(GroupSummary);

export const Member = z.object({
  userId: z.string(),
  displayName: z.string(),
  email: z.string(),
  role: Role,
});
export type Member = z.infer<typeof Member>;
export const MemberList = z.array(Member);

/** PATCH /api/groups/:id/members/:userId -> 200 Member. */
export const ChangeRoleRequest = z.object({ role: Role });
export type ChangeRoleRequest = z.infer<typeof ChangeRoleRequest>;
// DELETE /api/groups/:id/members/:userId -> 204 (removing yourself is leaving).
// POST /api/groups/:id/leave -> 204.

export const CreateInvitationRequest = z.object({ email: Email, role: Role });
export type CreateInvitationRequest = z.infer<typeof CreateInvitationRequest>;

/** POST /api/groups/:id/invitations (201) and items of GET (pending ones). No token: it is e-mailed only. */
export const Invitation = z.object({
  id: z.string(),
  groupId: z.string(),
  email: z.string(),
  role: Role,
  expiresAt: z.string(), // ISO 8601
  createdAt: z.string(),
});
export type Invitation = z.infer<typeof Invitation>;
export const InvitationList = z.array(Invitation);

export const invitationStatuses = ['pending', 'accepted', 'expired'] as const;
export const InvitationStatus = z.enum(invitationStatuses);
export type InvitationStatus = z.infer<typeof InvitationStatus>;

/** GET /api/invitations/:token -> 200 (404 when the token is unknown). Readable signed out. */
export const InvitationPreview = z.object({
  groupName: z.string(),
  role: Role,
  email: z.string(), // the address the invitation was sent to
  invitedBy: z.string(), // display name of the inviter
  expiresAt: z.string(),
  status: InvitationStatus,
});
export type InvitationPreview = z.infer<typeof InvitationPreview>;

/**
 * POST /api/invitations/:token/accept (signed in) -> 200 GroupSummary of the joined group.
 * 410 invitation_expired, 409 invitation_used, 409 already_member, 404 unknown token.
 * Any signed-in account may accept: the token is the secret, sent to the invited address only.
 */
export const AcceptInvitationResponse = GroupSummary;
