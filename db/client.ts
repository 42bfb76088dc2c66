import { drizzle, type NodePgDatabase } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import { databaseUrl } from "./config";
import * as schema from "./schema";

export type Db = NodePgDatabase<typeof schema>;

// One pool per process, kept on globalThis so `next dev` hot reloads don't open a new pool each time.
const g = globalThis as unknown as { miterwisePool?: Pool; miterwiseDb?: Db };

export const pool = g.miterwisePool ?? new Pool({ connectionString: databaseUrl(), max: 10 });
export const db: Db = g.miterwiseDb ?? drizzle(pool, { schema });

if (process.env.NODE_ENV !== "production") {
  g.miterwisePool = pool;
  g.miterwiseDb = db;
}

/** A transaction handle or the db itself: queries accept either so callers can compose them atomically. */
export type Tx = Db | Parameters<Parameters<Db["transaction"]>[0]>[0];
