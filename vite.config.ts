import { fileURLToPath } from 'node:url';
import vue from '@vitejs/plugin-vue';
import { defineConfig } from 'vitest/config';

const here = (path: string) => fileURLToPath(new URL(path, import.meta.url));

const alias = {
  '@web': here('./web'),
  '@api': here('./api'),
  '@grammar': here('./grammar'),
};

export default defineConfig({
  root: 'web',
  plugins: [vue()],
  resolve: { alias },
  build: { outDir: here('./dist/web'), emptyOutDir: true, chunkSizeWarningLimit: 900 },
  server: {
    host: '127.0.0.1',
    proxy: { '/api': 'http://127.0.0.1:3000', '/auth': 'http://127.0.0.1:3000' },
  },
  test: {
    root: here('.'),
    projects: [
      {
        plugins: [vue()],
        resolve: { alias },
        test: {
          name: 'web',
          root: here('.'),
          environment: 'jsdom',
          include: ['tests/web/**/*.test.ts'],
          setupFiles: ['tests/web/jsdom-stand-ins.ts'],
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'node',
          root: here('.'),
          environment: 'node',
          include: ['tests/**/*.test.ts'],
          exclude: ['tests/web/**', 'tests/e2e/**', 'tests/late/**', 'node_modules/**'],
          globalSetup: ['tests/helpers/global-setup.ts'],
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'e2e',
          root: here('.'),
          environment: 'node',
          include: ['tests/e2e/**/*.test.ts'],
          globalSetup: ['tests/helpers/global-setup.ts'],
          fileParallelism: false,
          testTimeout: 120_000,
          hookTimeout: 120_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'late',
          root: here('.'),
          environment: 'node',
          include: ['tests/late/**/*.test.ts'],
          globalSetup: ['tests/helpers/global-setup.ts'],
          fileParallelism: false,
          testTimeout: 120_000,
          hookTimeout: 120_000,
        },
      },
    ],
  },
});
