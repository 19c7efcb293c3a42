import { defineConfig, mergeConfig } from 'vitest/config';
import viteConfig from './vite.config.ts';

// Fast unit tests of pure web helpers; browser flows live in e2e/ (vitest.e2e.config.ts).
export default mergeConfig(
  viteConfig,
  defineConfig({
    test: {
      include: ['src/**/*.test.{ts,tsx}'],
      environment: 'node',
    },
  }),
);
