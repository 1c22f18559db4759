// Object storage through the S3 API. In development and tests the endpoint is the local
// fake (scripts/fakes/s3.ts); production points the same code at a real bucket by config.
import type { Readable } from 'node:stream';

import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';

import { config } from '../config';

const client = new S3Client({
  endpoint: config.s3.endpoint,
  region: config.s3.region,
  forcePathStyle: true,
  credentials: { accessKeyId: config.s3.accessKeyId, secretAccessKey: config.s3.secretAccessKey },
});

export async function putObject(key: string, body: Buffer, contentType: string, sha256Hex: string) {
  await client.send(
    new PutObjectCommand({
      Bucket: config.s3.bucket,
      Key: key,
      Body: body,
      ContentType: contentType,
      ContentLength: body.length,
      Metadata: { sha256: sha256Hex },
    }),
  );
}

export async function getObjectStream(key: string): Promise<Readable> {
  const result = await client.send(new GetObjectCommand({ Bucket: config.s3.bucket, Key: key }));
  return result.Body as Readable;
}

export async function deleteObject(key: string) {
  await client.send(new DeleteObjectCommand({ Bucket: config.s3.bucket, Key: key }));
}
