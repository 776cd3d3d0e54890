// The reference the kiosk path is measured against: a bare node:http server that answers the same
// manifest bytes with the same headers, and 304 to the same ETag, doing nothing else.
import { readFileSync } from 'node:fs';
import http from 'node:http';

const body = readFileSync(process.env.BARE_BODY_FILE);
const etag = process.env.BARE_ETAG;

const server = http.createServer((req, res) => {
  if (req.headers['if-none-match'] === etag) {
    res.writeHead(304, { ETag: etag, 'Cache-Control': 'no-cache' }).end();
    return;
  }
  res.writeHead(200, { 'Content-Type': 'application/json; charset=utf-8', 'Content-Length': body.length, ETag: etag, 'Cache-Control': 'no-cache' }).end(body);
});
server.listen(0, '127.0.0.1', () => console.log(`listening ${server.address().port}`));
process.on('SIGTERM', () => server.close(() => process.exit(0)));
