import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { fileURLToPath } from 'node:url';

const r = (p: string) => fileURLToPath(new URL(p, import.meta.url));
const apiPort = process.env.PORT ?? '5170';

export default defineConfig({
  plugins: [react(), tailwindcss()],
  resolve: {
    alias: {
      '@/': r('./src/'),
      '@shared/': r('./shared/'),
      '@server/': r('./server/'),
    },
  },
  // TypeORM entities use legacy decorators; tsx and vitest both need them.
  oxc: { decorator: { legacy: true } },
  server: {
    port: 5173,
    host: '127.0.0.1',
    proxy: { '/api': `http://127.0.0.1:${apiPort}`, '/media': `http://127.0.0.1:${apiPort}` },
  },
  build: {
    outDir: 'dist',
    sourcemap: true,
    chunkSizeWarningLimit: 900,
    // The plugin-timing note is for plugin authors; it is noise in `npm start`.
    rolldownOptions: { checks: { pluginTimings: false } },
  },
  test: {
    reporters: ['default', './tests/support/summary-reporter.ts'],
    projects: [
      {
        extends: true,
        test: { name: 'unit', include: ['tests/unit/**/*.test.ts'], exclude: ['tests/unit/client/**'], environment: 'node', sequence: { groupOrder: 0 } },
      },
      {
        extends: true,
        test: { name: 'client', include: ['tests/unit/client/**/*.test.{ts,tsx}'], environment: 'happy-dom', sequence: { groupOrder: 0 } },
      },
      {
        extends: true,
        test: {
          name: 'integration',
          include: ['tests/integration/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/support/global-setup.ts'],
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 120_000,
          sequence: { groupOrder: 1 },
        },
      },
      {
        extends: true,
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/support/global-setup.ts', 'tests/support/e2e-setup.ts'],
          fileParallelism: false,
          testTimeout: 120_000,
          hookTimeout: 180_000,
          sequence: { groupOrder: 2 },
        },
      },
    ],
  },
});
