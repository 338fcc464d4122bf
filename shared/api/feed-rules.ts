// What each role may do on the group feed, as pure predicates shared by the server (which
// enforces them) and the app (which only offers what would be allowed). Non-members see nothing.
import type { Role } from './groups';
import { canManage } from './roles';

/** Members and up share sketches, comment and add photos; viewers read only. */
export const canPost = (role: Role): boolean => role !== 'viewer';

/** Owners and admins remove anyone's comments and photos. */
export const canModerate = canManage;
