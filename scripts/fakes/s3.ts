// Local stand-in for S3-compatible object storage: the S3 API on loopback, files kept on disk.
import fs from 'node:fs';
import path from 'node:path';
// s3rver ships no types of its own.
// eslint-disable-next-line @typescript-eslint/no-require-imports
const S3rver = require('s3rver');

const endpoint = new URL(process.env.S3_ENDPOINT ?? 'http://127.0.0.1:4569');
const bucket = process.env.S3_BUCKET ?? 'sightline-files';
const directory = path.join(process.env.DATA_DIR ?? '.data', 's3', endpoint.port);
fs.mkdirSync(directory, { recursive: true });

const server = new S3rver({
  address: '127.0.0.1',
  port: Number(endpoint.port),
  directory,
  silent: true,
  configureBuckets: [{ name: bucket }],
});
server.run().then(() => console.log(`fake S3 on ${endpoint.origin}, bucket ${bucket}`));

const stop = () => {
  server.close().finally(() => process.exit(0));
};
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
