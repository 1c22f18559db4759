// Object storage through the S3 API. In development and tests the endpoint is the local
// fake (scripts/fakes/s3.ts); production points the same code at a real bucket by config.
import type { Readable } from 'node:stream';

import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';

import { config } from '../config';

// A storage service that accepts connections but never answers must not hold a request (and
// its memory and database connection) for long: connect and request timeouts, one retry.
const client = new S3Client({
  endpoint: config.s3.endpoint,
  region: config.s3.region,
  forcePathStyle: true,
  credentials: { accessKeyId: config.s3.accessKeyId, secretAccessKey: config.s3.secretAccessKey },
  maxAttempts: 2,
  requestHandler: {
    connectionTimeout: config.s3.connectTimeoutMs,
    requestTimeout: config.s3.requestTimeoutMs,
    throwOnRequestTimeout: true,
  },
});

export class StorageUnavailable extends Error {}

async function send<T>(work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (error) {
    // Missing objects and refused credentials are the caller's to judge; the rest means storage is down.
    const name = (error as { name?: string }).name;
    if (name === 'NoSuchKey' || name === 'AccessDenied') throw error;
    throw new StorageUnavailable((error as Error).message);
  }
}

export async function putObject(key: string, body: Buffer, contentType: string, sha256Hex: string) {
  await send(() =>
    client.send(
      new PutObjectCommand({
        Bucket: config.s3.bucket,
        Key: key,
        Body: body,
        ContentType: contentType,
        ContentLength: body.length,
        Metadata: { sha256: sha256Hex },
      }),
    ),
  );
}

export async function getObjectStream(key: string): Promise<Readable> {
  const result = await send(() => client.send(new GetObjectCommand({ Bucket: config.s3.bucket, Key: key })));
  return result.Body as Readable;
}

export async function deleteObject(key: string) {
  await send(() => client.send(new DeleteObjectCommand({ Bucket: config.s3.bucket, Key: key })));
}
