// One way to rate-limit a route: a budget per window, answered with 429 rate_limited and a
// message saying what to do. `options` picks the key and what counts (express-rate-limit).
import { rateLimit, type Options } from 'express-rate-limit';
import { AppError } from './errors';

export const limiter = (budget: { windowMs: number; limit: number }, message: string, options: Partial<Options> = {}) =>
  rateLimit({
    ...budget,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) => next(new AppError('rate_limited', 429, message)),
    ...options,
  });
