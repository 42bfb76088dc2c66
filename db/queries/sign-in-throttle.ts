import { inArray, sql } from "drizzle-orm";
import { db } from "../client";
import { signInThrottle } from "../schema";

/**
 * Counters for lib/auth/throttle.ts, one row per key. They live in PostgreSQL, so they hold across restarts
 * and across several app servers. Which keys count, and their limits, are the throttle's to decide.
 */
export async function findThrottleRows(keys: string[]) {
  return db
    .select({ key: signInThrottle.key, until: signInThrottle.blockedUntil, since: signInThrottle.firstFailureAt })
    .from(signInThrottle)
    .where(inArray(signInThrottle.key, keys));
}

/**
 * One more failure under this key, in one statement: the counter restarts when its window has passed, and
 * once the limit is reached the key is blocked for 2^(failures - limit) minutes, at most `maxBlockMinutes`.
 */
export async function countFailure(key: string, { limit, windowMinutes, maxBlockMinutes }: { limit: number; windowMinutes: number; maxBlockMinutes: number }) {
  await db.execute(sql`
    insert into sign_in_throttle as t (key, failures, first_failure_at, blocked_until)
    values (${key}, 1, now(), ${limit <= 1 ? sql`now() + interval '1 minute'` : sql`null`})
    on conflict (key) do update set
      failures = case when t.first_failure_at < now() - make_interval(mins => ${windowMinutes}) then 1 else t.failures + 1 end,
      first_failure_at = case when t.first_failure_at < now() - make_interval(mins => ${windowMinutes}) then now() else t.first_failure_at end,
      blocked_until = case
        when t.first_failure_at >= now() - make_interval(mins => ${windowMinutes}) and t.failures + 1 >= ${limit}
        then now() + make_interval(mins => least(${maxBlockMinutes}, power(2, t.failures + 1 - ${limit})::int))
        else t.blocked_until end
  `);
}

export async function clearThrottleKey(key: string) {
  await db.delete(signInThrottle).where(inArray(signInThrottle.key, [key]));
}

/** Stamps a success under this key now (its `first_failure_at` holds when it last succeeded). */
export async function markSucceeded(key: string) {
  await db.execute(sql`
    insert into sign_in_throttle (key, failures, first_failure_at) values (${key}, 0, now())
    on conflict (key) do update set first_failure_at = now()
  `);
}
