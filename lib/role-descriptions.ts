// The words the app shows for each role; what a role may do is shared/api/roles.ts.
import type { Role } from '@/shared/api/groups';

export const roleDescriptions: Record<Role, string> = {
  owner: 'Manages the group, its members and owners',
  admin: 'Invites people and manages members',
  member: 'Shares sketches, comments and starts runs',
  viewer: 'Reads the feed and results only',
};
