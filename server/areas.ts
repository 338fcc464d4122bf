// The server's areas, each a folder with routes.ts exporting routes(deps): Router (routes carry
// their full paths, e.g. /api/groups). Adding an area = a folder + one line here.
import type { Router } from 'express';
import * as activity from './activity/routes';
import * as auth from './auth/routes';
import * as comments from './comments/routes';
import type { Deps } from './deps';
import * as feed from './feed/routes';
import * as groups from './groups/routes';
import * as invitations from './invitations/routes';
import * as devMail from './mail/routes';
import * as members from './members/routes';
import * as notifications from './notifications/routes';
import * as photos from './photos/routes';
import * as runs from './runs/routes';
import * as sketches from './sketches/routes';
import * as sync from './sync/routes';
import * as uploads from './uploads/routes';

interface Area {
  routes(deps: Deps): Router;
  /** Background work the area runs while the server is up (e.g. the runs scheduler). */
  start?(deps: Deps): Promise<{ stop(): Promise<void> }>;
}

// activity comes first: it stamps last-active on every signed-in request, then passes it on.
export const areas: Area[] = [activity, auth, groups, invitations, sketches, sync, uploads, feed, comments, photos, members, notifications, runs];

/** Mounted only when config.devPages is on (never in production). */
export const devAreas: Area[] = [devMail];
