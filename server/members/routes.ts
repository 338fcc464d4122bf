import { Router } from 'express';
import { z } from 'zod';
import { memberPaths } from '@/shared/api/members';
import { currentUser, requireAuth } from '../auth/middleware';
import type { Deps } from '../deps';
import { GroupParams } from '../groups/routes';
import { parse } from '../http/validate';
import * as members from './use-cases';

const InvitationParams = GroupParams.extend({ invitationId: z.uuid({ message: 'Invitation id must be a UUID' }) });

export function routes(deps: Deps): Router {
  const router = Router();
  const auth = requireAuth(deps);
  router.get(memberPaths.roster(':id'), auth, async (req, res) => {
    const { id } = parse(GroupParams, req.params, 'path');
    res.json(await members.roster(deps, currentUser(req), id));
  });
  router.post(memberPaths.resend(':id', ':invitationId'), auth, async (req, res) => {
    const { id, invitationId } = parse(InvitationParams, req.params, 'path');
    res.json(await members.resend(deps, currentUser(req), id, invitationId));
  });
  return router;
}
