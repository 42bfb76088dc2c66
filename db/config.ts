/**
 * Where the database is. The default is the project's private PostgreSQL on loopback (scripts/lib.sh starts
 * it), so the demo and the tests need no configuration; lib/env.ts validates the whole environment at start-up.
 */
export const DEFAULT_DATABASE_URL = "postgres://miterwise@127.0.0.1:54329/miterwise";

export const databaseUrl = (source: Record<string, string | undefined> = process.env) =>
  source.DATABASE_URL || DEFAULT_DATABASE_URL;
