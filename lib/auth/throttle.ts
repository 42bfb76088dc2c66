import { blockedUntil, recordFailedAttempt, recordSuccessfulAttempt, type ThrottleSubject } from "@/db/queries/sign-in-throttle";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { clientAddress } from "./client-address";

/** The caller's address for throttling, as our server reported it (see client-address.ts). */
export const requestAddress = (headers: Headers | Record<string, unknown> | undefined) =>
  clientAddress(headers, { peerToken: process.env.MITERWISE_PEER_TOKEN, trustedProxies: env.TRUSTED_PROXY_COUNT });

/** Refuses with 429 while the subject is blocked; the message says how long to wait. */
export async function assertNotThrottled(subject: ThrottleSubject) {
  const until = await blockedUntil(subject);
  if (!until) return;
  const minutes = Math.max(1, Math.ceil((until.getTime() - Date.now()) / 60_000));
  throw new AppError(429, `Too many failed attempts. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}.`);
}

export { recordFailedAttempt, recordSuccessfulAttempt };
