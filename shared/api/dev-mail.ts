// GET /api/dev/mail (development and tests only): every message the local SMTP fake received,
// oldest first. Browser tests read it to follow invitation links.
import { z } from 'zod';

export const devMailPaths = { list: '/api/dev/mail', page: '/dev/mail' } as const;

export const KeptMail = z.object({
  id: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  date: z.string(), // ISO 8601, when the fake received it
  links: z.array(z.string()), // every http(s) URL in the text, in order
});
export type KeptMail = z.infer<typeof KeptMail>;
export const KeptMailList = z.array(KeptMail);
