import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

/** Pure web-app logic (board moves, drafts, parsing); components are covered by the end-to-end journeys. */
export default defineConfig({
  resolve: { alias: { '@': fileURLToPath(new URL('./src', import.meta.url)) } },
  root: fileURLToPath(new URL('.', import.meta.url)),
  test: { name: 'web', include: ['src/**/*.test.ts'], environment: 'node' },
});
