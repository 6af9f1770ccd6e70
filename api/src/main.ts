import type { NestExpressApplication } from '@nestjs/platform-express';
import { loadConfig } from './config.js';
import { createApp } from './create-app.js';
import { StartupError } from './data-dir.js';
import { demoAccountsWarning } from './database/seed.js';

function listen(app: NestExpressApplication, port: number): Promise<void> {
  return app.listen(port).then(
    () => undefined,
    (error: NodeJS.ErrnoException) => {
      if (error.code === 'EADDRINUSE') {
        throw new StartupError(
          `Port ${port} is already in use (is Gumshoe already running?); set PORT to another port`,
        );
      }
      if (error.code === 'EACCES')
        throw new StartupError(`Port ${port} needs more privileges; set PORT above 1023`);
      throw error;
    },
  );
}

async function main(): Promise<void> {
  const config = loadConfig();
  const app = await createApp(config);
  app.enableShutdownHooks(['SIGINT', 'SIGTERM']);
  try {
    await listen(app, config.port);
  } catch (error) {
    await app.close();
    throw error;
  }
  console.log(
    `Gumshoe ${config.version} at http://localhost:${config.port} (data in ${config.dataDir})`,
  );
  const warning = await demoAccountsWarning(app);
  if (warning) console.warn(warning);
}

main().catch((error: unknown) => {
  const message = error instanceof Error ? error.message : String(error);
  console.error(
    `gumshoe: ${error instanceof StartupError ? '' : 'could not start: '}${message.split('\n')[0]}`,
  );
  process.exit(1);
});
