import { defineConfig } from 'vitest/config';

// The browser suite: Debian's Chromium, driven by playwright-core, against a freshly
// started production server (built PWA + API) on a free port with a temporary data folder.
export default defineConfig({
  test: {
    name: 'browser',
    environment: 'node',
    include: ['e2e/**/*.e2e.ts'],
    globalSetup: ['e2e/global-setup.ts'],
    fileParallelism: false,
    testTimeout: 120_000,
    hookTimeout: 120_000,
  },
});
