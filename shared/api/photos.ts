// Board photos of a sketch: uploaded as multipart (field "file"), checked by content (JPEG, PNG
// or WebP), re-encoded as JPEG without metadata (so no EXIF location) and thumbnailed.
import { z } from 'zod';

export const photoPaths = {
  photos: (sketchId: string) => `/api/sketches/${sketchId}/photos`, // GET list, POST upload (multipart)
  photo: (photoId: string) => `/api/photos/${photoId}`, // DELETE (uploader or group admin)
  /** GET the bytes; the URLs in Photo carry a short-lived signature instead of a Bearer token. */
  file: (photoId: string, variant: PhotoVariant) => `/api/photos/${photoId}/${variant}`,
} as const;

export const photoVariants = ['full', 'thumb'] as const;
export const PhotoVariant = z.enum(photoVariants);
export type PhotoVariant = z.infer<typeof PhotoVariant>;

export const maxPhotoBytes = 10 * 1024 * 1024;
export const photoTypes = ['jpeg', 'png', 'webp'] as const;

export const Photo = z.object({
  id: z.string(),
  sketchId: z.string(),
  uploader: z.object({ id: z.string(), displayName: z.string() }),
  width: z.int(),
  height: z.int(),
  url: z.string(),
  thumbUrl: z.string(),
  createdAt: z.string(),
});
export type Photo = z.infer<typeof Photo>;
export const PhotoList = z.array(Photo);
