// The local stand-in for the venue's mail service: accepts every message on loopback and keeps it
// as an .eml file, so people and tests can read what Mantlepiece sent. Development and tests only.
import fs from 'node:fs';
import path from 'node:path';
import crypto from 'node:crypto';
import { SMTPServer } from 'smtp-server';

const port = Number(process.env.SMTP_PORT ?? 2525);
const mailDir = path.resolve(process.env.MAIL_DIR ?? '.data/mail');
fs.mkdirSync(mailDir, { recursive: true });

const server = new SMTPServer({
  authOptional: true,
  disabledCommands: ['STARTTLS'],
  logger: false,
  onData(stream, session, callback) {
    const chunks = [];
    stream.on('data', (chunk) => chunks.push(chunk));
    stream.on('end', () => {
      const name = `${new Date().toISOString().replace(/[:.]/g, '-')}-${crypto.randomBytes(4).toString('hex')}.eml`;
      const envelope = `X-Envelope-To: ${session.envelope.rcptTo.map((r) => r.address).join(', ')}\r\n`;
      // Write then rename, so a reader never sees half a message.
      const tmp = path.join(mailDir, `.${name}`);
      fs.writeFileSync(tmp, Buffer.concat([Buffer.from(envelope), ...chunks]));
      fs.renameSync(tmp, path.join(mailDir, name));
      callback();
    });
  },
});

server.on('error', (error) => {
  console.error(`SMTP stand-in: ${error.message}`);
  process.exit(1);
});
server.listen(port, '127.0.0.1', () => console.log(`SMTP stand-in listening on 127.0.0.1:${port}, mail in ${mailDir}`));
const stop = () => server.close(() => process.exit(0));
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
