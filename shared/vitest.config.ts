import { defineProject } from 'vitest/config';

export default defineProject({
  test: {
    name: 'shared',
    environment: 'node',
    include: ['src/**/*.test.ts'],
    // Oracles and properties solve hundreds of trips; on a busy 2-core CI machine they need more than the default
    // 5 s. Speed is measured in `npm run bench`, never here.
    testTimeout: 60_000,
  },
});
