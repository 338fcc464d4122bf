import { Router } from 'express';
import { z } from 'zod';
import { ChangeRoleRequest, CreateGroupRequest, groupPaths } from '@/shared/api/groups';
import { currentUser, requireAuth } from '../auth/middleware';
import type { Deps } from '../deps';
import { parse } from '../http/validate';
import * as groups from './use-cases';

export const GroupParams = z.object({ id: z.uuid({ message: 'Group id must be a UUID' }) });
const MemberParams = GroupParams.extend({ userId: z.uuid({ message: 'User id must be a UUID' }) });

export function routes(deps: Deps): Router {
  const router = Router();
  const auth = requireAuth(deps);

  router.post(groupPaths.groups, auth, async (req, res) => {
    res.status(201).json(await groups.createGroup(deps, currentUser(req), parse(CreateGroupRequest, req.body)));
  });
  router.get(groupPaths.groups, auth, async (req, res) => {
    res.json(await groups.listMyGroups(deps, currentUser(req)));
  });
  router.get(groupPaths.group(':id'), auth, async (req, res) => {
    const { id } = parse(GroupParams, req.params, 'path');
    res.json(await groups.getGroup(deps, currentUser(req), id));
  });
  router.get(groupPaths.members(':id'), auth, async (req, res) => {
    const { id } = parse(GroupParams, req.params, 'path');
    res.json(await groups.listMembers(deps, currentUser(req), id));
  });
  router.patch(groupPaths.member(':id', ':userId'), auth, async (req, res) => {
    const { id, userId } = parse(MemberParams, req.params, 'path');
    const { role } = parse(ChangeRoleRequest, req.body);
    res.json(await groups.changeRole(deps, currentUser(req), id, userId, role));
  });
  router.delete(groupPaths.member(':id', ':userId'), auth, async (req, res) => {
    const { id, userId } = parse(MemberParams, req.params, 'path');
    await groups.removeMember(deps, currentUser(req), id, userId);
    res.status(204).end();
  });
  router.post(groupPaths.leave(':id'), auth, async (req, res) => {
    const { id } = parse(GroupParams, req.params, 'path');
    const caller = currentUser(req);
    await groups.removeMember(deps, caller, id, caller.id);
    res.status(204).end();
  });
  return router;
}
