import { defineConfig } from 'vitest/config';
import { fileURLToPath } from 'node:url';

export default defineConfig({
  resolve: { alias: { '@': fileURLToPath(new URL('.', import.meta.url)), 'server-only': fileURLToPath(new URL('./tests/support/server-only-stub.ts', import.meta.url)) } },
  test: {
    include: ['tests/unit/**/*.test.ts', 'tests/reference/**/*.test.ts', 'tests/db/**/*.test.ts', 'lib/**/*.test.ts'],
    environment: 'node',
    testTimeout: 20000,
    fileParallelism: true,
  },
});
