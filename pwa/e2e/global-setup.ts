import { existsSync } from 'node:fs';
import type { TestProject } from 'vitest/node';
import { CHROMIUM_PATH } from './browser';
import { startServer } from './server';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    dataDir: string;
  }
}

export default async function setup(project: TestProject) {
  if (!existsSync(CHROMIUM_PATH)) {
    throw new Error(
      `Chromium is missing at ${CHROMIUM_PATH}: install it with "apt-get install -y chromium".`,
    );
  }
  const server = await startServer();
  project.provide('baseUrl', server.baseUrl);
  project.provide('dataDir', server.dataDir);
  return () => server.stop();
}
