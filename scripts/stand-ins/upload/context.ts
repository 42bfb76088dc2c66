import type { KeyLocks } from "./key-locks";
import type { CallbackRegistry } from "./registry";
import type { UploadStore } from "./storage";

export type UploadStandInOptions = {
  port: number;
  /** Loopback by default: the stand-in has no users, only a shared key. */
  host?: string;
  /** Where files live (bytes + JSON sidecars); nothing is written outside it. */
  dataDir: string;
  /** The same `UPLOADTHING_TOKEN` the app uses; its api key verifies and makes signatures. */
  token: string;
  /** Largest file accepted (default 256 MB). */
  maxFileBytes?: number;
  /** How long a finished PUT waits for the app's `/callback-result` before answering `serverData: null` (15 s). */
  callbackTimeoutMs?: number;
  /** How long a finished PUT waits for its key's `/route-metadata` registration (15 s). */
  registrationWaitMs?: number;
  /** How long a registration (and a dev-mode metadata stream) lives without its uploads arriving (1 h). */
  registrationTtlMs?: number;
  /** Upper bound for receiving one request, body included (10 min). */
  requestTimeoutMs?: number;
  /** Base URL put into file links; default: the origin each request reached the stand-in by. */
  publicUrl?: string;
  /** Where to report problems nobody else hears about (failed callbacks); default silent. */
  log?: (line: string) => void;
  /** Also log every request with its status and duration (UPLOAD_STAND_IN_TRACE=1 for the script). */
  trace?: boolean;
};

export type Limits = {
  maxFileBytes: number;
  callbackTimeoutMs: number;
  registrationWaitMs: number;
  registrationTtlMs: number;
  requestTimeoutMs: number;
  /** How long the callback POST to the app may take; longer than the result wait, so a slow app still gets it. */
  callbackDeliveryMs: number;
  /** JSON bodies (API calls, callback results) are small; anything bigger is refused. */
  maxJsonBytes: number;
  /** How long a HEAD waits for an in-flight PUT of the same key before reporting its resume point. */
  headWaitMs: number;
};

export function limitsFrom(opts: UploadStandInOptions): Limits {
  const callbackTimeoutMs = opts.callbackTimeoutMs ?? 15_000;
  return {
    maxFileBytes: opts.maxFileBytes ?? 256 * 1024 * 1024,
    callbackTimeoutMs,
    callbackDeliveryMs: Math.max(30_000, callbackTimeoutMs * 2),
    registrationWaitMs: opts.registrationWaitMs ?? 15_000,
    registrationTtlMs: opts.registrationTtlMs ?? 60 * 60_000,
    requestTimeoutMs: opts.requestTimeoutMs ?? 10 * 60_000,
    maxJsonBytes: 1024 * 1024,
    headWaitMs: 5_000,
  };
}

/** Everything a route needs, built once per stand-in. */
export type StandIn = {
  apiKey: string;
  appId: string;
  store: UploadStore;
  registry: CallbackRegistry;
  locks: KeyLocks;
  limits: Limits;
  /** The stand-in's own base URL (known once listening). */
  selfUrl: string;
  publicUrl: string | undefined;
  log: (line: string) => void;
  /** Aborted by close(), so no callback to the app outlives the stand-in. */
  shutdown: AbortSignal;
};

/** File links for a stored key, the shapes the SDK expects back from an upload. */
export function fileUrls(base: string, appId: string, key: string) {
  return { url: `${base}/f/${key}`, appUrl: `${base}/a/${appId}/${key}`, ufsUrl: `${base}/f/${key}` };
}
