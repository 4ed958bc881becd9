import { defineConfig, mergeConfig } from 'vitest/config';
import viteConfig from './vite.config.ts';

// Browser journeys: Debian's Chromium driven by playwright-core against the real app on a free port.
export default mergeConfig(
  viteConfig,
  defineConfig({
    test: {
      name: 'e2e',
      include: ['tests/e2e/**/*.e2e.ts'],
      environment: 'node',
      globalSetup: ['tests/helpers/global-setup.ts', 'tests/e2e/helpers/global-app.ts'],
      fileParallelism: false,
      testTimeout: 120_000,
      hookTimeout: 180_000,
    },
  }),
);
