// The server's areas, each a folder with routes.ts exporting routes(deps): Router (routes carry
// their full paths, e.g. /api/groups). Adding an area = a folder + one line here.
import type { Router } from 'express';
import * as auth from './auth/routes';
import type { Deps } from './deps';
import * as groups from './groups/routes';
import * as invitations from './invitations/routes';
import * as devMail from './mail/routes';
import * as sketches from './sketches/routes';
import * as sync from './sync/routes';
import * as uploads from './uploads/routes';

interface Area {
  routes(deps: Deps): Router;
}

export const areas: Area[] = [auth, groups, invitations, sketches, sync, uploads];

/** Mounted only when config.devPages is on (never in production). */
export const devAreas: Area[] = [devMail];
