import { defineConfig, mergeConfig } from 'vitest/config';
import viteConfig from './vite.config.ts';

// Three projects so that pure tests never wait for PostgreSQL:
// unit (engine, shared code), components (jsdom) and api (real PostgreSQL started by globalSetup).
export default mergeConfig(
  viteConfig,
  defineConfig({
    test: {
      projects: [
        {
          extends: true,
          test: { name: 'unit', include: ['tests/engine/**/*.test.ts', 'tests/shared/**/*.test.ts'], environment: 'node' },
        },
        {
          extends: true,
          test: { name: 'components', include: ['tests/components/**/*.test.ts'], environment: 'jsdom' },
        },
        {
          extends: true,
          test: {
            name: 'api',
            include: ['tests/api/**/*.test.ts', 'tests/server/**/*.test.ts'],
            environment: 'node',
            globalSetup: ['tests/helpers/global-setup.ts'],
            // One PostgreSQL, many files: files run one at a time so truncation in one never races another.
            fileParallelism: false,
            testTimeout: 60_000,
            hookTimeout: 120_000,
          },
        },
      ],
    },
  }),
);
