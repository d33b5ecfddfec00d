/**
 * The PostgreSQL side of the tests, used when TEST_DATABASE_URL names a server (see
 * scripts/with-postgres.ts): each test database is a copy of one migrated template, which the
 * global setup builds once per run, so no test waits for migrations and workers never race.
 */

/** The migrated template every test database is copied from. */
export const TEMPLATE_DATABASE = "satura_template";

export const testServerUrl = (): string | undefined => process.env.TEST_DATABASE_URL || undefined;
