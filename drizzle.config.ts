import { defineConfig } from 'drizzle-kit';

/** `npx drizzle-kit generate` writes reviewed, committed SQL into db/migrations. Never `push`. */
export default defineConfig({
  dialect: 'postgresql',
  schema: './db/schema/index.ts',
  out: './db/migrations',
  casing: 'snake_case',
});
