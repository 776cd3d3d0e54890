import { Injectable, NotFoundException } from '@nestjs/common';
import { readdir, readFile } from 'node:fs/promises';
import path from 'node:path';
import mailparser from 'mailparser';
import type { Page } from '@mantlepiece/shared';
import { PageQuery, pageWindow, toPage } from '../common/page.js';
import { ConfigService } from '../config/config.service.js';

export interface CapturedMailSummary {
  id: string;
  to: string;
  subject: string;
  date: string | null;
}

export interface CapturedMail extends CapturedMailSummary {
  from: string;
  text: string;
  html: string | null;
}

/** The stand-in names each message after the moment it arrived, so names sort by time. */
const MESSAGE_ID = /^[A-Za-z0-9_-]+$/;

/** Reads the .eml files the local SMTP stand-in writes. Development only: production sends real mail. */
@Injectable()
export class DevMailService {
  constructor(private readonly config: ConfigService) {}

  async list(query: PageQuery): Promise<Page<CapturedMailSummary>> {
    const dir = this.mailDir();
    const ids = (await readdir(dir).catch(() => [] as string[]))
      .filter((name) => name.endsWith('.eml') && !name.startsWith('.'))
      .map((name) => name.slice(0, -'.eml'.length))
      .sort()
      .reverse();
    const { offset, limit } = pageWindow(query);
    const items = await Promise.all(ids.slice(offset, offset + limit).map(async (id) => {
      const { text: _text, html: _html, from: _from, ...summary } = await this.read(dir, id);
      return summary;
    }));
    return toPage(items, ids.length, query);
  }

  async get(id: string): Promise<CapturedMail> {
    const dir = this.mailDir();
    if (!MESSAGE_ID.test(id)) throw new NotFoundException('There is no such message.');
    return this.read(dir, id);
  }

  private mailDir(): string {
    if (this.config.isProduction || !this.config.mailDir) {
      throw new NotFoundException('Captured mail is only kept by the development mail stand-in.');
    }
    return this.config.mailDir;
  }

  private async read(dir: string, id: string): Promise<CapturedMail> {
    const raw = await readFile(path.join(dir, `${id}.eml`)).catch(() => null);
    if (!raw) throw new NotFoundException('There is no such message.');
    const mail = await mailparser.simpleParser(raw);
    const envelopeTo = mail.headers.get('x-envelope-to');
    const to = Array.isArray(mail.to) ? mail.to.map((a) => a.text).join(', ') : mail.to?.text;
    return {
      id,
      to: typeof envelopeTo === 'string' ? envelopeTo : (to ?? ''),
      from: mail.from?.text ?? '',
      subject: mail.subject ?? '',
      date: mail.date ? mail.date.toISOString() : null,
      text: mail.text ?? '',
      html: typeof mail.html === 'string' ? mail.html : null,
    };
  }
}
