import { fileURLToPath, URL } from 'node:url'
import vue from '@vitejs/plugin-vue'
import { defineConfig } from 'vitest/config'

const alias = {
  '@': fileURLToPath(new URL('./src', import.meta.url)),
  '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
}

export default defineConfig({
  plugins: [vue()],
  resolve: { alias },
  server: {
    port: 5173,
    // FITWRIGHT_API_PROXY points the dev client at an API on another port (e.g. http://localhost:3101).
    proxy: { '/api': process.env.FITWRIGHT_API_PROXY ?? 'http://localhost:3000' },
  },
  build: {
    outDir: 'dist',
    chunkSizeWarningLimit: 700,
  },
  test: {
    projects: [
      {
        extends: true,
        test: { name: 'shared', include: ['tests/shared/**/*.test.ts'], environment: 'node' },
      },
      {
        extends: true,
        test: {
          name: 'server',
          include: ['tests/server/**/*.test.ts'],
          environment: 'node',
          setupFiles: ['tests/helpers/server-setup.ts'],
          // Password hashing at the production cost takes seconds when every core is busy.
          testTimeout: 20_000,
        },
      },
      {
        extends: true,
        test: { name: 'client', include: ['tests/client/**/*.test.ts'], environment: 'happy-dom' },
      },
      {
        extends: true,
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/helpers/e2e-global-setup.ts'],
          testTimeout: 60_000,
          hookTimeout: 180_000,
          fileParallelism: false,
        },
      },
    ],
  },
})
