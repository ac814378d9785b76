import { defineProject } from 'vitest/config';

/** Browser tests: the real built app in headless Chromium; one app and one build shared by every file. */
export default defineProject({
  test: {
    name: 'browser',
    environment: 'node',
    include: ['**/*.browser.test.ts'],
    globalSetup: ['./global-setup.ts'],
    testTimeout: 60_000,
    hookTimeout: 180_000,
    fileParallelism: false,
  },
});
