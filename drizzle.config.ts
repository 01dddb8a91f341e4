import { defineConfig } from 'drizzle-kit';

// `npm run db:generate` writes SQL migrations into drizzle/ from server/db/schema.ts (no database needed).
// Migrations are applied from code (server/db/migrate.ts) at start-up and in the test setup.
export default defineConfig({
  dialect: 'postgresql',
  schema: './server/db/schema.ts',
  out: './drizzle',
  dbCredentials: { url: process.env.DATABASE_URL ?? 'postgres://localhost/quadrant' },
  strict: true,
  verbose: true,
});
