import { APP_DATABASE_NAME, createDatabaseIfMissing, databaseUrlFor, migrateDatabase } from './database';
import { ensurePostgres, type PostgresHandle } from './postgres';
import { quietlayerMode } from './quietlayer-mode';
import { runDemoSeed } from './seed/run-demo-seed';

export interface AppDatabase {
  /** URL of the application database, to hand to the server as DATABASE_URL. */
  databaseUrl: string;
  postgres: PostgresHandle;
}

/**
 * Everything `npm start` and `npm run dev` need before the server boots: a running PostgreSQL,
 * the `quietlayer` database (or DATABASE_URL as given), the committed migrations applied and,
 * in demo mode, the demo scenario seeded (insert-only, never overwriting).
 */
export async function prepareAppDatabase(options: { seed?: boolean } = {}): Promise<AppDatabase> {
  const postgres = await ensurePostgres();
  try {
    let databaseUrl = process.env.DATABASE_URL;
    if (!databaseUrl) {
      if (await createDatabaseIfMissing(postgres.adminUrl, APP_DATABASE_NAME)) {
        console.log(`PostgreSQL: created database "${APP_DATABASE_NAME}"`);
      }
      databaseUrl = databaseUrlFor(postgres.adminUrl, APP_DATABASE_NAME);
    }
    await migrateDatabase(databaseUrl);
    console.log('Database: migrations applied');
    if (options.seed !== false) {
      if (quietlayerMode() === 'demo') {
        const inserted = await runDemoSeed(databaseUrl);
        const summary = Object.entries(inserted).map(([step, rows]) => `${step} +${rows}`).join(', ');
        console.log(`Demo data: ${summary}`);
      } else {
        console.log('Production mode: no demo data is seeded');
      }
    }
    return { databaseUrl, postgres };
  } catch (error) {
    await postgres.stop();
    throw error;
  }
}
