import 'reflect-metadata';
import type { INestApplicationContext } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import { parseArgs } from 'node:util';
import { PASSWORD_PROBLEMS, passwordProblem } from '@mantlepiece/shared';
import { ConfigService } from './config/config.service.js';
import { migrate } from './database/migrator.js';
import { MediaService } from './media/media.service.js';
import { SeedModule } from './seed/seed.module.js';
import { SeedService } from './seed/seed.service.js';
import { isCommonPassword } from './users/password-rules.js';

const USAGE = `Usage: node dist/cli.js <command>
  migrate                                   apply pending database migrations
  seed                                      add the demo scenario to an empty database (not in production)
  create-admin --email <address> --name <n> create the first admin; password from ADMIN_PASSWORD or stdin
  strip-originals                           keep again, without EXIF, GPS, XMP or IPTC, images uploaded before originals were kept that way`;

async function withSeedService<T>(work: (seed: SeedService) => Promise<T>): Promise<T> {
  return withSeedContext((context) => work(context.get(SeedService)));
}

async function withSeedContext<T>(work: (context: INestApplicationContext) => Promise<T>): Promise<T> {
  const context = await NestFactory.createApplicationContext(SeedModule, { logger: ['error', 'warn'] });
  try {
    return await work(context);
  } finally {
    await context.close();
  }
}

async function readStdin(): Promise<string> {
  if (process.stdin.isTTY) process.stderr.write('Password (input is shown; prefer ADMIN_PASSWORD): ');
  const chunks: Buffer[] = [];
  for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks).toString('utf8').replace(/\r?\n$/, '');
}

const commands: Record<string, (args: string[]) => Promise<string>> = {
  async migrate() {
    const applied = await migrate(new ConfigService().databaseUrl);
    return applied.length ? `applied ${applied.join(', ')}` : 'database schema is up to date';
  },
  async seed() {
    const config = new ConfigService();
    if (config.isProduction) throw new Error('refusing to seed demo accounts when NODE_ENV=production; use create-admin');
    const seeded = await withSeedService((seed) => seed.seedDemo(config.demoPassword));
    return seeded ? 'demo scenario seeded' : 'people already exist; demo scenario left alone';
  },
  async 'create-admin'(args) {
    const { values } = parseArgs({ args, options: { email: { type: 'string' }, name: { type: 'string' } } });
    if (!values.email || !values.name) throw new Error('create-admin needs --email and --name');
    const password = process.env.ADMIN_PASSWORD ?? (await readStdin());
    const problem = passwordProblem(password, isCommonPassword);
    if (problem) throw new Error(`the password: ${PASSWORD_PROBLEMS[problem]}`);
    const user = await withSeedService((seed) => seed.createAdmin(values.email!, values.name!, password));
    return `admin ${user.email} created`;
  },
  async 'strip-originals'() {
    const stripped = await withSeedContext((context) => context.get(MediaService, { strict: false }).stripStoredOriginals());
    return `${stripped} original${stripped === 1 ? '' : 's'} kept again without metadata`;
  },
};

const [name, ...args] = process.argv.slice(2);
const command = name ? commands[name] : undefined;
if (!command) {
  console.error(USAGE);
  process.exit(2);
}
try {
  console.log(await command(args));
} catch (error) {
  console.error(`${name}: ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
}
