// Photo URLs an <img> can load without a Bearer header: the path carries an expiry and an
// HMAC over (photo, variant, expiry) under the server secret. Handed out only to callers who
// may see the sketch; valid for an hour.
import { createHmac, timingSafeEqual } from 'node:crypto';
import { photoPaths, type PhotoVariant } from '@/shared/api/photos';

const TTL_MS = 3600_000;

const mac = (secret: string, id: string, variant: PhotoVariant, exp: number) =>
  createHmac('sha256', secret).update(`photo:${id}:${variant}:${exp}`).digest('base64url');

export function signedPhotoUrl(secret: string, id: string, variant: PhotoVariant, now: Date): string {
  // Rounded up to the next full hour, so URLs (and so the browser cache) stay stable for a while.
  const exp = Math.ceil((now.getTime() + TTL_MS) / TTL_MS) * TTL_MS;
  return `${photoPaths.file(id, variant)}?exp=${exp}&sig=${mac(secret, id, variant, exp)}`;
}

export function checkSignature(secret: string, id: string, variant: PhotoVariant, exp: number, sig: string, now: Date): boolean {
  if (!(exp > now.getTime())) return false;
  const want = Buffer.from(mac(secret, id, variant, exp));
  const got = Buffer.from(sig);
  return want.length === got.length && timingSafeEqual(want, got);
}
