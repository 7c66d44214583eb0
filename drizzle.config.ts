import { defineConfig } from 'drizzle-kit';

// `npm run db:generate -- --name <what-changed>` writes a named migration into drizzle/.
// Generation compares the schema files with drizzle/meta and needs no running database.
export default defineConfig({
  dialect: 'postgresql',
  schema: './server/db/schema/*.ts',
  out: './drizzle',
  dbCredentials: { url: process.env.DATABASE_URL ?? 'postgres://localhost/gridkeep' },
  casing: 'snake_case',
  strict: true,
});
