import fs from 'node:fs';
import net from 'node:net';
import path from 'node:path';
import type { INestApplication } from '@nestjs/common';
import { getModelToken } from '@nestjs/sequelize';
import mailparser, { type ParsedMail } from 'mailparser';
import { OutboxMessage } from '../src/mail/models/outbox-message.model.js';

/** The stand-in's folder; `npm test` sets it, and SMTP_PORT, for the stand-in it starts. */
export function mailDir(): string {
  const dir = process.env.MAIL_DIR;
  if (!dir || !process.env.SMTP_PORT) throw new Error('MAIL_DIR and SMTP_PORT must point at the running SMTP stand-in');
  return dir;
}

/** A port nothing listens on: SMTP that is down. */
export function closedPort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer().once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as net.AddressInfo;
      server.close(() => resolve(port));
    });
  });
}

/** The messages the stand-in captured for one recipient (it records the envelope's RCPT TO). */
export async function capturedMailTo(recipient: string): Promise<ParsedMail[]> {
  const dir = mailDir();
  const files = fs.readdirSync(dir).filter((name) => name.endsWith('.eml') && !name.startsWith('.'));
  // A whole run leaves thousands of messages: only those whose envelope line names the recipient are parsed.
  const envelopeLine = `\nx-envelope-to: ${recipient.toLowerCase()}\r\n`;
  const raws = files.map((name) => fs.readFileSync(path.join(dir, name))).filter((raw) => `\n${raw.toString('latin1').toLowerCase()}`.includes(envelopeLine));
  const parsed = await Promise.all(raws.map((raw) => mailparser.simpleParser(raw)));
  return parsed.filter((mail) => mail.headers.get('x-envelope-to') === recipient);
}

/**
 * Suites share one database, and earlier ones leave unsent mail behind (every submission mails
 * every educator). A suite that waits for its own message in the worker's next batch starts clean.
 */
export async function discardUnsentMail(app: INestApplication): Promise<void> {
  await app.get<typeof OutboxMessage>(getModelToken(OutboxMessage)).destroy({ where: { sentAt: null } });
}
