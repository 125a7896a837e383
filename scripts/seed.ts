/**
 * `npm run seed`: migrates the application database and inserts the demo scenario (demo mode only).
 * Insert-only and idempotent: rows that already exist, including ones people changed, are left alone.
 */
import { prepareAppDatabase } from './lib/app-database';
import { runMain } from './lib/setup-error';

runMain(async () => {
  const { postgres } = await prepareAppDatabase({ seed: true });
  await postgres.stop();
});
