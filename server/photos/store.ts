// Where board photo bytes live, behind one small interface: a local folder by default, or an
// S3-compatible bucket (AWS, MinIO, a local fake) through @aws-sdk/client-s3 when configured.
import { mkdir, readFile, rm, writeFile } from 'node:fs/promises';
import { dirname, join, resolve } from 'node:path';
import { DeleteObjectCommand, GetObjectCommand, NoSuchKey, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';

export interface PhotoStore {
  put(key: string, bytes: Buffer, contentType: string): Promise<void>;
  /** null when there is no such object. */
  get(key: string): Promise<Buffer | null>;
  /** Deleting a missing key is not an error. */
  delete(key: string): Promise<void>;
}

export type PhotoStorage =
  | { kind: 'disk'; dir: string }
  | {
      kind: 's3';
      bucket: string;
      /** Omit for AWS itself; a URL for any other S3-compatible service. */
      endpoint?: string;
      region: string;
      accessKeyId?: string;
      secretAccessKey?: string;
      /** Bucket in the path (most non-AWS services need it). */
      forcePathStyle: boolean;
    };

/** Keys are made by the server (uuid or sha256/variant); anything else is refused so no path escapes the folder. */
const checkKey = (key: string) => {
  if (!/^([0-9a-f-]{36}|[0-9a-f]{64})\/[a-z]+$/.test(key)) throw new Error(`bad photo key ${JSON.stringify(key)}`);
  return key;
};

export function diskStore(dir: string): PhotoStore {
  const root = resolve(dir);
  const path = (key: string) => join(root, checkKey(key));
  return {
    async put(key, bytes) {
      // Owner-only, like the database: photos are readable only through the access checks.
      await mkdir(dirname(path(key)), { recursive: true, mode: 0o700 });
      await writeFile(path(key), bytes, { mode: 0o600 });
    },
    async get(key) {
      return readFile(path(key)).catch((err: NodeJS.ErrnoException) => {
        if (err.code === 'ENOENT') return null;
        throw err;
      });
    },
    async delete(key) {
      await rm(path(key), { force: true });
      await rm(dirname(path(key)), { recursive: false, force: true }).catch(() => undefined); // only when empty
    },
  };
}

export function s3Store(c: Extract<PhotoStorage, { kind: 's3' }>): PhotoStore {
  const client = new S3Client({
    region: c.region,
    endpoint: c.endpoint,
    forcePathStyle: c.forcePathStyle,
    ...(c.accessKeyId && c.secretAccessKey && { credentials: { accessKeyId: c.accessKeyId, secretAccessKey: c.secretAccessKey } }),
  });
  return {
    async put(key, bytes, contentType) {
      await client.send(new PutObjectCommand({ Bucket: c.bucket, Key: checkKey(key), Body: bytes, ContentType: contentType }));
    },
    async get(key) {
      try {
        const out = await client.send(new GetObjectCommand({ Bucket: c.bucket, Key: checkKey(key) }));
        return out.Body ? Buffer.from(await out.Body.transformToByteArray()) : null;
      } catch (err) {
        if (err instanceof NoSuchKey || (err as { name?: string }).name === 'NoSuchKey') return null;
        throw err;
      }
    },
    async delete(key) {
      await client.send(new DeleteObjectCommand({ Bucket: c.bucket, Key: checkKey(key) }));
    },
  };
}

const stores = new WeakMap<PhotoStorage, PhotoStore>();

/** One store per configuration object (an S3 client keeps its connections). */
export function photoStoreFor(c: PhotoStorage): PhotoStore {
  let s = stores.get(c);
  if (!s) stores.set(c, (s = c.kind === 'disk' ? diskStore(c.dir) : s3Store(c)));
  return s;
}
