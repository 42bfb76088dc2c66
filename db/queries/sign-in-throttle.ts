import { inArray, sql } from "drizzle-orm";
import { db } from "../client";
import { signInThrottle } from "../schema";

/**
 * Failed sign-ins are counted per account and per address in PostgreSQL (not memory), so the limit
 * holds across restarts and across several app servers. After `limit` failures inside the window,
 * each further failure blocks the key for a doubling delay (1 min, 2, 4 … capped at 15 min).
 */
export const throttlePolicy = {
  windowMinutes: 15,
  maxBlockMinutes: 15,
  limits: { email: 5, ip: 20 },
} as const;

export type ThrottleKey = { kind: keyof typeof throttlePolicy.limits; value: string };
const keyOf = (k: ThrottleKey) => `${k.kind}:${k.value.toLowerCase()}`;

/** The latest moment any of the keys is blocked until, or null when sign-in may be tried. */
export async function blockedUntil(keys: ThrottleKey[]): Promise<Date | null> {
  if (keys.length === 0) return null;
  const rows = await db
    .select({ until: signInThrottle.blockedUntil })
    .from(signInThrottle)
    .where(inArray(signInThrottle.key, keys.map(keyOf)));
  const now = Date.now();
  const until = rows.map((r) => r.until?.getTime() ?? 0).filter((t) => t > now);
  return until.length ? new Date(Math.max(...until)) : null;
}

export async function recordSignInFailure(keys: ThrottleKey[]) {
  const { windowMinutes, maxBlockMinutes } = throttlePolicy;
  for (const k of keys) {
    const limit = throttlePolicy.limits[k.kind];
    // One statement per key: the counter restarts when the window has passed, and the block grows
    // as 2^(failures - limit) minutes once the limit is reached.
    await db.execute(sql`
      insert into sign_in_throttle as t (key, failures, first_failure_at, blocked_until)
      values (${keyOf(k)}, 1, now(), ${limit <= 1 ? sql`now() + interval '1 minute'` : sql`null`})
      on conflict (key) do update set
        failures = case when t.first_failure_at < now() - make_interval(mins => ${windowMinutes}) then 1 else t.failures + 1 end,
        first_failure_at = case when t.first_failure_at < now() - make_interval(mins => ${windowMinutes}) then now() else t.first_failure_at end,
        blocked_until = case
          when t.first_failure_at >= now() - make_interval(mins => ${windowMinutes}) and t.failures + 1 >= ${limit}
          then now() + make_interval(mins => least(${maxBlockMinutes}, power(2, t.failures + 1 - ${limit})::int))
          else t.blocked_until end
    `);
  }
}

export async function clearSignInFailures(key: ThrottleKey) {
  await db.delete(signInThrottle).where(inArray(signInThrottle.key, [keyOf(key)]));
}
