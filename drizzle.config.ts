import { defineConfig } from 'drizzle-kit';

// Generates SQL migrations from the TypeScript schema (`npx drizzle-kit generate`); no database
// is needed for that. The API applies the committed migrations at start-up.
export default defineConfig({
  dialect: 'postgresql',
  schema: './schema/src/index.ts',
  out: './schema/migrations',
});
