import fs from 'node:fs/promises';
import path from 'node:path';
import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import type { Env } from '../env';

/** Where document files live. Keys are server-made (a UUID and an extension), never user input. */
export interface Storage {
  put(key: string, body: Buffer, contentType: string): Promise<void>;
  get(key: string): Promise<Buffer>;
  delete(key: string): Promise<void>;
}

const KEY = /^[a-z0-9-]+\.[a-z]{3,4}$/;

function checkKey(key: string): string {
  if (!KEY.test(key)) throw new Error(`Refusing storage key ${JSON.stringify(key)}`);
  return key;
}

/** The default: files in a folder on the server's disk (UPLOAD_DIR). */
export function localDiskStorage(dir: string): Storage {
  const root = path.resolve(dir);
  const at = (key: string) => path.join(root, checkKey(key));
  return {
    async put(key, body) {
      await fs.mkdir(root, { recursive: true });
      await fs.writeFile(at(key), body, { flag: 'wx' });
    },
    get: (key) => fs.readFile(at(key)),
    async delete(key) {
      await fs.rm(at(key), { force: true });
    },
  };
}

/** For tests: keeps files in memory and lets a test look inside. */
export function memoryStorage(): Storage & { keys(): string[] } {
  const files = new Map<string, Buffer>();
  return {
    async put(key, body) {
      files.set(checkKey(key), Buffer.from(body));
    },
    async get(key) {
      const file = files.get(key);
      if (!file) throw new Error(`No stored file ${key}`);
      return file;
    },
    async delete(key) {
      files.delete(key);
    },
    keys: () => [...files.keys()],
  };
}

export type S3Settings = {
  bucket: string;
  region: string;
  endpoint?: string;
  accessKeyId?: string;
  secretAccessKey?: string;
  forcePathStyle: boolean;
};

/** A hosted object store through the AWS SDK (S3 or an S3-compatible service via S3_ENDPOINT). */
export function s3Storage(settings: S3Settings, client?: S3Client): Storage {
  const s3 =
    client ??
    new S3Client({
      region: settings.region,
      endpoint: settings.endpoint,
      forcePathStyle: settings.forcePathStyle,
      credentials:
        settings.accessKeyId && settings.secretAccessKey
          ? { accessKeyId: settings.accessKeyId, secretAccessKey: settings.secretAccessKey }
          : undefined,
    });
  const Bucket = settings.bucket;
  return {
    async put(key, body, contentType) {
      await s3.send(new PutObjectCommand({ Bucket, Key: checkKey(key), Body: body, ContentType: contentType }));
    },
    async get(key) {
      const out = await s3.send(new GetObjectCommand({ Bucket, Key: checkKey(key) }));
      if (!out.Body) throw new Error(`Empty object ${key}`);
      return Buffer.from(await out.Body.transformToByteArray());
    },
    async delete(key) {
      await s3.send(new DeleteObjectCommand({ Bucket, Key: checkKey(key) }));
    },
  };
}

/** The hosted store when S3_BUCKET is set, the local disk otherwise. */
export function createStorage(env: Pick<Env, 'UPLOAD_DIR' | 'S3_BUCKET' | 'S3_REGION' | 'S3_ENDPOINT' | 'S3_ACCESS_KEY_ID' | 'S3_SECRET_ACCESS_KEY' | 'S3_FORCE_PATH_STYLE'>): Storage {
  if (!env.S3_BUCKET) return localDiskStorage(env.UPLOAD_DIR);
  return s3Storage({
    bucket: env.S3_BUCKET,
    region: env.S3_REGION,
    endpoint: env.S3_ENDPOINT,
    accessKeyId: env.S3_ACCESS_KEY_ID,
    secretAccessKey: env.S3_SECRET_ACCESS_KEY,
    forcePathStyle: env.S3_FORCE_PATH_STYLE,
  });
}
