import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { AppModule } from './app.module.js';
import { configureApp } from './app.setup.js';
import { jwtSecret } from './auth/jwt-secret.js';
import type { Config } from './config.js';
import { prepareDataDir } from './data-dir.js';

/**
 * Builds the whole server for `config` (migrated database, seed, mail server) without listening.
 * Nest's own start-up logging is off: a failure reaches the caller as one error, not a stack dump.
 */
export async function createApp(config: Config): Promise<NestExpressApplication> {
  prepareDataDir(config.dataDir);
  const app = await NestFactory.create<NestExpressApplication>(
    AppModule.forRoot(config, jwtSecret(config.jwtSecret, config.dataDir)),
    { bodyParser: false, abortOnError: false, logger: false },
  );
  app.useLogger(['error', 'warn']);
  configureApp(app, config);
  await app.init();
  return app;
}
