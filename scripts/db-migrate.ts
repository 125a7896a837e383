/**
 * `npm run db:migrate`: applies the committed migrations in ./drizzle to the application database
 * (DATABASE_URL, or the embedded server's `quietlayer` database, which is created if missing).
 */
import { prepareAppDatabase } from './lib/app-database';
import { runMain } from './lib/setup-error';

runMain(async () => {
  const { postgres } = await prepareAppDatabase({ seed: false });
  await postgres.stop();
});
