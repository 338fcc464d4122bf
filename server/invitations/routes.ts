import { Router } from 'express';
import { z } from 'zod';
import { CreateInvitationRequest, groupPaths } from '@/shared/api/groups';
import { currentUser, requireAuth } from '../auth/middleware';
import type { Deps } from '../deps';
import { GroupParams } from '../groups/routes';
import { parse } from '../http/validate';
import * as invitations from './use-cases';

const InvitationParams = GroupParams.extend({ invitationId: z.uuid({ message: 'Invitation id must be a UUID' }) });
const TokenParams = z.object({ token: z.string().min(1).max(200) });

export function routes(deps: Deps): Router {
  const router = Router();
  const auth = requireAuth(deps);

  router.post(groupPaths.invitations(':id'), auth, async (req, res) => {
    const { id } = parse(GroupParams, req.params, 'path');
    const input = parse(CreateInvitationRequest, req.body);
    res.status(201).json(await invitations.invite(deps, currentUser(req), id, input));
  });
  router.get(groupPaths.invitations(':id'), auth, async (req, res) => {
    const { id } = parse(GroupParams, req.params, 'path');
    res.json(await invitations.listInvitations(deps, currentUser(req), id));
  });
  router.delete(groupPaths.pendingInvitation(':id', ':invitationId'), auth, async (req, res) => {
    const { id, invitationId } = parse(InvitationParams, req.params, 'path');
    await invitations.revoke(deps, currentUser(req), id, invitationId);
    res.status(204).end();
  });
  // Readable signed out, so the invite page can say what it is before asking to sign in.
  router.get(groupPaths.invitation(':token'), async (req, res) => {
    const { token } = parse(TokenParams, req.params, 'path');
    res.json(await invitations.preview(deps, token));
  });
  router.post(groupPaths.accept(':token'), auth, async (req, res) => {
    const { token } = parse(TokenParams, req.params, 'path');
    res.json(await invitations.accept(deps, currentUser(req), token));
  });
  return router;
}
