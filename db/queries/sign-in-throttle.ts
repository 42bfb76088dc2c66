import { inArray, sql } from "drizzle-orm";
import { db } from "../client";
import { signInThrottle } from "../schema";
import { UNKNOWN_ADDRESS } from "@/lib/auth/client-address";

/**
 * Anti-automation for anything that checks or sets a password (sign-in, accepting an invitation), after
 * OWASP ASVS V2.2: it must stop guessing without letting a stranger lock the owner out.
 * - pair (one account from one address): strict — the brute-force limit.
 * - account (from anywhere) and address (any accounts): loose — they catch guessing spread over many addresses
 *   or many accounts, and an office behind one address is not blocked by a few people's typos.
 * An address the account signed in from successfully in the last `knownDays` is held to the pair limit only, so
 * failures a stranger causes elsewhere do not lock the owner out of their usual place.
 * Past a limit, each further failure inside the window blocks for a doubling delay (1 min, 2, 4 … the cap).
 * Counters live in PostgreSQL, so they hold across restarts and across several app servers.
 */
export const throttlePolicy = {
  pair: { limit: 5, windowMinutes: 60, maxBlockMinutes: 15 },
  account: { limit: 50, windowMinutes: 60, maxBlockMinutes: 30 },
  address: { limit: 100, windowMinutes: 60, maxBlockMinutes: 30 },
  knownDays: 30,
} as const;

/** Who is trying: the account (lower-cased e-mail) when the attempt names one, and the client's address. */
export type ThrottleSubject = { account: string | null; address: string };

type Kind = "pair" | "account" | "address";

function keysOf(s: ThrottleSubject) {
  const account = s.account?.toLowerCase() ?? null;
  const address = s.address.toLowerCase();
  // Requests that did not come through our server share the address "unknown"; counting that bucket would
  // let anyone block everyone, so only the account and pair counters apply to them.
  const counted: { kind: Kind; key: string }[] = address === UNKNOWN_ADDRESS ? [] : [{ kind: "address", key: `address:${address}` }];
  if (account) counted.push({ kind: "pair", key: `pair:${account} ${address}` }, { kind: "account", key: `account:${account}` });
  return { counted, known: account ? `known:${account} ${address}` : null };
}

/** The latest moment any applicable counter is blocked until, or null when an attempt may be made. */
export async function blockedUntil(subject: ThrottleSubject): Promise<Date | null> {
  const { counted, known } = keysOf(subject);
  const rows = await db
    .select({ key: signInThrottle.key, until: signInThrottle.blockedUntil, since: signInThrottle.firstFailureAt })
    .from(signInThrottle)
    .where(inArray(signInThrottle.key, [...counted.map((k) => k.key), ...(known ? [known] : [])]));
  const now = Date.now();
  const knownRow = rows.find((r) => r.key === known);
  const isKnown = knownRow !== undefined && knownRow.since.getTime() > now - throttlePolicy.knownDays * 86_400_000;
  const applies = new Set(counted.filter((k) => k.kind === "pair" || !isKnown).map((k) => k.key));
  const until = rows.filter((r) => applies.has(r.key)).map((r) => r.until?.getTime() ?? 0).filter((t) => t > now);
  return until.length ? new Date(Math.max(...until)) : null;
}

export async function recordFailedAttempt(subject: ThrottleSubject) {
  for (const { kind, key } of keysOf(subject).counted) {
    const { limit, windowMinutes, maxBlockMinutes } = throttlePolicy[kind];
    // One statement per key: the counter restarts when its window has passed, and the block grows as
    // 2^(failures - limit) minutes once the limit is reached.
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
}

/**
 * A right password: this pair starts afresh and the address becomes known for the account (the row's
 * `first_failure_at` holds when it last succeeded). Account and address counters are left alone, so one
 * success does not wipe the evidence of guessing elsewhere.
 */
export async function recordSuccessfulAttempt(subject: ThrottleSubject) {
  const { counted, known } = keysOf(subject);
  const pair = counted.find((k) => k.kind === "pair");
  if (pair) await db.delete(signInThrottle).where(inArray(signInThrottle.key, [pair.key]));
  if (known) {
    await db.execute(sql`
      insert into sign_in_throttle (key, failures, first_failure_at) values (${known}, 0, now())
      on conflict (key) do update set first_failure_at = now()
    `);
  }
}
