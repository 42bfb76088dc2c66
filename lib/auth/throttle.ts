import { clearThrottleKey, countFailure, findThrottleRows, markSucceeded } from "@/db/queries/sign-in-throttle";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { clientAddress, UNKNOWN_ADDRESS } from "./client-address";

/**
 * Anti-automation for anything that checks or sets a password (sign-in, accepting an invitation), after
 * OWASP ASVS V2.2: it must stop guessing without letting a stranger lock the owner out.
 * - pair (one account from one address): strict — the brute-force limit.
 * - account (from anywhere) and address (any accounts): loose — they catch guessing spread over many addresses
 *   or many accounts, and an office behind one address is not blocked by a few people's typos.
 * An address the account signed in from successfully in the last `knownDays` is held to the pair limit only, so
 * failures a stranger causes elsewhere do not lock the owner out of their usual place.
 * Past a limit, each further failure inside the window blocks for a doubling delay (1 min, 2, 4 … the cap).
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

/** The caller's address for throttling, as our server reported it (see client-address.ts). */
export const requestAddress = (headers: Headers | Record<string, unknown> | undefined) =>
  clientAddress(headers, { peerToken: process.env.MITERWISE_PEER_TOKEN, trustedProxies: env.TRUSTED_PROXY_COUNT });

/** The latest moment any applicable counter is blocked until, or null when an attempt may be made. */
export async function blockedUntil(subject: ThrottleSubject): Promise<Date | null> {
  const { counted, known } = keysOf(subject);
  const rows = await findThrottleRows([...counted.map((k) => k.key), ...(known ? [known] : [])]);
  const now = Date.now();
  const knownRow = rows.find((r) => r.key === known);
  const isKnown = knownRow !== undefined && knownRow.since.getTime() > now - throttlePolicy.knownDays * 86_400_000;
  const applies = new Set(counted.filter((k) => k.kind === "pair" || !isKnown).map((k) => k.key));
  const until = rows.filter((r) => applies.has(r.key)).map((r) => r.until?.getTime() ?? 0).filter((t) => t > now);
  return until.length ? new Date(Math.max(...until)) : null;
}

/** Refuses with 429 while the subject is blocked; the message says how long to wait. */
export async function assertNotThrottled(subject: ThrottleSubject) {
  const until = await blockedUntil(subject);
  if (!until) return;
  const minutes = Math.max(1, Math.ceil((until.getTime() - Date.now()) / 60_000));
  throw new AppError(429, `Too many failed attempts. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}.`);
}

export async function recordFailedAttempt(subject: ThrottleSubject) {
  for (const { kind, key } of keysOf(subject).counted) await countFailure(key, throttlePolicy[kind]);
}

/**
 * A right password: this pair starts afresh and the address becomes known for the account. Account and
 * address counters are left alone, so one success does not wipe the evidence of guessing elsewhere.
 */
export async function recordSuccessfulAttempt(subject: ThrottleSubject) {
  const { counted, known } = keysOf(subject);
  const pair = counted.find((k) => k.kind === "pair");
  if (pair) await clearThrottleKey(pair.key);
  if (known) await markSucceeded(known);
}
