import express from 'express';
import pino from 'pino';
import request from 'supertest';
import { AppError, errorHandler } from '@/server/http/errors';

// A bare app around the one error middleware: what reaches the client from each kind of error.
function appThrowing(err: unknown) {
  const app = express();
  app.use((req, _res, next) => {
    req.log = pino({ level: 'silent' });
    next();
  });
  app.get('/boom', () => {
    throw err;
  });
  app.use(errorHandler);
  return app;
}

describe('errorHandler', () => {
  it('maps an AppError to its status, code and message', async () => {
    const res = await request(appThrowing(new AppError('forbidden', 403, 'Not for you'))).get('/boom');
    expect(res.status).toBe(403);
    expect(res.body).toEqual({ error: { code: 'forbidden', message: 'Not for you' } });
  });

  it('hides everything about an unexpected error: no message, no stack', async () => {
    const res = await request(appThrowing(new Error('secret detail in /srv/x.ts:12'))).get('/boom');
    expect(res.status).toBe(500);
    expect(res.body).toEqual({ error: { code: 'internal', message: 'Something went wrong on the server' } });
    expect(res.text).not.toContain('secret');
  });
});
