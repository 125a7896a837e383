import { defineConfig } from 'vitest/config';

// One run of every test in the project. tests/setup/global-setup.ts gives the run its own fresh
// PostgreSQL database (DATABASE_URL) with the migrations applied and the demo users seeded.
export default defineConfig({
  test: {
    include: ['shared/**/*.test.ts', 'server/**/*.test.ts', 'src/**/*.test.{ts,tsx}', 'tests/**/*.test.ts'],
    exclude: ['**/node_modules/**', 'dist/**', '.data/**'],
    globalSetup: ['tests/setup/global-setup.ts'],
    setupFiles: ['tests/setup/fast-check-seed.ts'],
    pool: 'forks',
    maxWorkers: 2,
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
