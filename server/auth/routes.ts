import { Router, type Request } from 'express';
import { ChangePasswordRequest, LoginRequest, RegisterRequest, authPaths } from '@/shared/api/auth';
import type { Deps } from '../deps';
import { limiter } from '../http/rate-limit';
import { parse } from '../http/validate';
import { currentUser, requireAuth } from './middleware';
import { changePassword, login, register, signOutEverywhere } from './use-cases';

export function routes(deps: Deps): Router {
  const router = Router();
  // Only failures count (a seminar behind one address signs in as often as it likes): per
  // client address for sign-in and sign-up together, and per account for sign-in, so guessing
  // one person's password from many addresses stops too.
  const limit = (message: string, keyGenerator?: (req: Request) => string) =>
    limiter(deps.config.authRateLimit, message, { skipSuccessfulRequests: true, ...(keyGenerator && { keyGenerator }) });
  const perAddress = limit('Too many failed sign-in attempts from your network; wait a few minutes and try again');
  const perAccount = limit('Too many failed sign-ins to this account; wait a few minutes and try again', (req) =>
    `account:${String(req.body?.email ?? '').trim().toLowerCase()}`,
  );

  router.post(authPaths.register, perAddress, async (req, res) => {
    res.status(201).json(await register(deps, parse(RegisterRequest, req.body)));
  });
  router.post(authPaths.login, perAddress, perAccount, async (req, res) => {
    res.json(await login(deps, parse(LoginRequest, req.body)));
  });
  router.get(authPaths.me, requireAuth(deps), (req, res) => {
    res.json(currentUser(req));
  });
  router.post(authPaths.signOutEverywhere, requireAuth(deps), async (req, res) => {
    await signOutEverywhere(deps, currentUser(req).id);
    res.status(204).end();
  });
  // A stolen token must not guess the password behind it: wrong guesses count per address.
  router.post(authPaths.password, requireAuth(deps), perAddress, async (req, res) => {
    res.json(await changePassword(deps, currentUser(req).id, parse(ChangePasswordRequest, req.body)));
  });
  return router;
}
