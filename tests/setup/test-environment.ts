/** Every per-run test database is named `${TEST_DATABASE_PREFIX}<epoch ms>_<pid>`. */
export const TEST_DATABASE_PREFIX = 'quietlayer_test_';

/** Session secret for tests only (iron-session needs at least 32 characters). */
export const TEST_SESSION_SECRET = 'quietlayer-test-session-secret-not-for-any-real-use';
