import swc from 'unplugin-swc';
import { defineProject } from 'vitest/config';

/**
 * Nest needs decorator metadata for constructor injection; esbuild/oxc drop it, so SWC transforms the
 * server's TypeScript here (the plugin reads `emitDecoratorMetadata` from server/tsconfig.json).
 */
export default defineProject({
  plugins: [swc.vite({ module: { type: 'es6' } })],
  test: {
    name: 'server',
    environment: 'node',
    include: ['src/**/*.test.ts', 'test/**/*.e2e-spec.ts'],
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
