// The local stand-in for a venue network's S3-compatible object storage: s3rver on loopback, with
// one bucket whose files live in a folder. Tests and the bench only; a venue points S3_ENDPOINT at
// its own storage.
import fs from 'node:fs';
import path from 'node:path';
import S3rver from 's3rver';

const port = Number(process.env.S3_STAND_IN_PORT ?? 4568);
const bucket = process.env.S3_BUCKET ?? 'mantlepiece';
const directory = path.resolve(process.env.S3_STAND_IN_DIR ?? '.data/s3');
fs.mkdirSync(directory, { recursive: true });

// Kiosks follow a redirect to a presigned URL from their own origin, so the bucket answers CORS for GET and HEAD.
const cors = `<CORSConfiguration><CORSRule><AllowedOrigin>*</AllowedOrigin><AllowedMethod>GET</AllowedMethod><AllowedMethod>HEAD</AllowedMethod>
<AllowedHeader>*</AllowedHeader><ExposeHeader>Content-Range</ExposeHeader><ExposeHeader>ETag</ExposeHeader></CORSRule></CORSConfiguration>`;

const server = new S3rver({ address: '127.0.0.1', port, silent: true, directory, configureBuckets: [{ name: bucket, configs: [cors] }] });
server.run().then(
  () => console.log(`S3 stand-in listening on 127.0.0.1:${port}, bucket ${bucket} in ${directory}`),
  (error) => {
    console.error(`S3 stand-in: ${error.message}`);
    process.exit(1);
  },
);
const stop = () => server.close().then(() => process.exit(0));
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
