import crypto from 'node:crypto';
import fs from 'node:fs/promises';
import path from 'node:path';
import { DeleteObjectCommand, GetObjectCommand, NoSuchKey, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import type { Config } from '../config/env';

/**
 * Where photo files live: a local folder by default, S3-compatible object storage when configured.
 * Keys are made by `newStorageKey` (random, never from a file name); `get` answers null for a key
 * that is not there; `delete` of a missing key is not an error.
 */
export interface Storage {
  put(key: string, body: Buffer, contentType: string): Promise<void>;
  get(key: string): Promise<Buffer | null>;
  delete(key: string): Promise<void>;
}

const KEY = /^[0-9a-f-]{36}\/[0-9a-f]{32}(-thumb)?\.jpg$/;

/** A random key under the workshop's prefix: `<workshopId>/<32 hex>.jpg` and its `-thumb` twin. */
export function newStorageKey(workshopId: string): { key: string; thumbKey: string } {
  const name = crypto.randomBytes(16).toString('hex');
  return { key: `${workshopId}/${name}.jpg`, thumbKey: `${workshopId}/${name}-thumb.jpg` };
}

function checkKey(key: string) {
  if (!KEY.test(key)) throw new Error('Not a storage key made by newStorageKey');
}

/** Files under `dir` (created when missing). Writes go to a temporary name first, then rename. */
export function createLocalStorage(dir: string): Storage {
  const root = path.resolve(dir);
  const fileOf = (key: string) => {
    checkKey(key);
    return path.join(root, key);
  };
  return {
    async put(key, body) {
      const file = fileOf(key);
      await fs.mkdir(path.dirname(file), { recursive: true });
      const temp = `${file}.${crypto.randomBytes(4).toString('hex')}.part`;
      try {
        await fs.writeFile(temp, body, { flag: 'wx' });
        await fs.rename(temp, file);
      } catch (err) {
        await fs.rm(temp, { force: true });
        throw err;
      }
    },
    async get(key) {
      try {
        return await fs.readFile(fileOf(key));
      } catch (err) {
        if ((err as NodeJS.ErrnoException).code === 'ENOENT') return null;
        throw err;
      }
    },
    async delete(key) {
      await fs.rm(fileOf(key), { force: true });
    },
  };
}

type S3Settings = NonNullable<Config['uploads']['s3']>;

/** An S3-compatible bucket through the AWS SDK (path-style addressing for self-hosted stores). */
export function createS3Storage(s3: S3Settings): Storage {
  const client = new S3Client({
    endpoint: s3.endpoint,
    region: s3.region,
    forcePathStyle: s3.forcePathStyle,
    credentials: { accessKeyId: s3.accessKeyId, secretAccessKey: s3.secretAccessKey },
    // Checksums only where S3 requires them: self-hosted stores do not all know the newer headers.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
  return {
    async put(key, body, contentType) {
      checkKey(key);
      await client.send(new PutObjectCommand({ Bucket: s3.bucket, Key: key, Body: body, ContentType: contentType }));
    },
    async get(key) {
      checkKey(key);
      try {
        const res = await client.send(new GetObjectCommand({ Bucket: s3.bucket, Key: key }));
        return res.Body ? Buffer.from(await res.Body.transformToByteArray()) : null;
      } catch (err) {
        if (err instanceof NoSuchKey || (err as { name?: string }).name === 'NoSuchKey') return null;
        throw err;
      }
    },
    async delete(key) {
      checkKey(key);
      await client.send(new DeleteObjectCommand({ Bucket: s3.bucket, Key: key }));
    },
  };
}

export function createStorage(uploads: Config['uploads']): Storage {
  return uploads.s3 ? createS3Storage(uploads.s3) : createLocalStorage(uploads.dir);
}
