import { defineConfig } from 'drizzle-kit';

// drizzle-kit reads the schema and writes SQL migrations into ./drizzle.
// `npm run db:generate -- --name=<what-changed>` after editing server/db/schema.
export default defineConfig({
  dialect: 'postgresql',
  schema: './server/db/schema/index.ts',
  out: './drizzle',
  dbCredentials: {
    url: process.env.DATABASE_URL ?? 'postgres://postgres@127.0.0.1:54329/quietlayer',
  },
});
