import 'reflect-metadata';
import { Logger } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { AppModule } from './app.module.js';
import { initApp } from './app.setup.js';
import { ConfigService } from './config/config.service.js';

const app = await NestFactory.create<NestExpressApplication>(AppModule);
await initApp(app);
// SIGINT and SIGTERM close the app: the outbox worker stops and the database pool drains.
app.enableShutdownHooks();
const config = app.get(ConfigService);
await app.listen(config.port, config.host);
new Logger('Mantlepiece').log(`listening on http://${config.host}:${config.port} (public URL ${config.publicUrl})`);
