import { defineConfig } from 'vitest/config';

/**
 * One `vitest run` drives every workspace: each project keeps its own config beside its code.
 * The browser project builds and starts the real app once (see e2e/global-setup.ts).
 */
export default defineConfig({
  test: {
    projects: ['shared/vitest.config.ts', 'server/vitest.config.ts', 'client/vitest.config.ts', 'e2e/vitest.config.ts'],
  },
});
