// Development-only pages over the SMTP fake: a JSON list for tests and an HTML page where the
// links in the kept mail can be clicked. Mounted only when config.devPages is on.
import { Router } from 'express';
import { devMailPaths, type KeptMail } from '@/shared/api/dev-mail';
import type { Deps } from '../deps';
import { notFound } from '../http/errors';
import { URL_PATTERN } from './smtp-fake';

const isLoopback = (address = '') => address === '::1' || /^(::ffff:)?127\./.test(address);

const escape = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

/** The text with its URLs turned into links; everything else escaped. */
function linkify(text: string): string {
  return escape(text).replace(URL_PATTERN, (url) => `<a href="${url}">${url}</a>`);
}

function page(mail: KeptMail[]): string {
  const items = mail
    .slice()
    .reverse()
    .map(
      (m) => `<article><h2>${escape(m.subject)}</h2>
<p class="meta">To ${escape(m.to.join(', '))} &middot; from ${escape(m.from)} &middot; ${escape(m.date)}</p>
<pre>${linkify(m.text)}</pre></article>`,
    )
    .join('\n');
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Kept mail - Overstrand</title>
<meta name="viewport" content="width=device-width, initial-scale=1">
<style>body{font-family:system-ui,sans-serif;max-width:46rem;margin:2rem auto;padding:0 1rem;color:#222}
h1{font-size:1.6rem}h2{font-size:1.05rem;margin:.8rem 0 .2rem}article{border-top:1px solid #ddd;padding:.5rem 0}.meta{color:#666;font-size:.85rem}pre{white-space:pre-wrap;font-size:.85rem}</style>
</head><body><h1>Kept mail</h1><p>Development only: every message the server sent, newest first.</p>
${items || '<p>No mail yet.</p>'}</body></html>`;
}

export function routes({ mailbox }: Deps): Router {
  const router = Router();
  if (!mailbox) return router;
  // The kept mail holds every invitation link: only this machine may read it, whatever HOST
  // says. The socket's address, not req.ip, so no X-Forwarded-For can pass for loopback.
  router.use([devMailPaths.list, devMailPaths.page], (req, _res, next) => {
    if (!isLoopback(req.socket.remoteAddress)) throw notFound();
    next();
  });
  router.get(devMailPaths.list, (_req, res) => {
    res.json(mailbox.list());
  });
  router.get(devMailPaths.page, (_req, res) => {
    res.type('html').send(page(mailbox.list()));
  });
  return router;
}
