import { Router } from 'express';
import { rateLimit } from 'express-rate-limit';
import { LoginRequest, RegisterRequest, authPaths } from '@/shared/api/auth';
import type { Deps } from '../deps';
import { AppError } from '../http/errors';
import { parse } from '../http/validate';
import { currentUser, requireAuth } from './middleware';
import { login, register } from './use-cases';

export function routes(deps: Deps): Router {
  const router = Router();
  // One budget for sign-in and sign-up together, per client address.
  const limiter = rateLimit({
    ...deps.config.authRateLimit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) =>
      next(new AppError('rate_limited', 429, 'Too many sign-in attempts; wait a few minutes and try again')),
  });

  router.post(authPaths.register, limiter, async (req, res) => {
    res.status(201).json(await register(deps, parse(RegisterRequest, req.body)));
  });
  router.post(authPaths.login, limiter, async (req, res) => {
    res.json(await login(deps, parse(LoginRequest, req.body)));
  });
  router.get(authPaths.me, requireAuth(deps), (req, res) => {
    res.json(currentUser(req));
  });
  return router;
}
