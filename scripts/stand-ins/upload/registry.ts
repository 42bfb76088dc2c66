import type { ServerResponse } from "node:http";

/** What the app told `/route-metadata` about a batch of presigned keys. */
export type Registration = {
  metadata: unknown;
  isDev: boolean;
  /** The app's route handler, `?slug=` included. */
  callbackUrl: string;
  awaitServerData: boolean;
  /** How the app reached the stand-in; the app posts `/callback-result` back to this origin. */
  origin: string;
};

export type CallbackOutcome = { serverData: unknown } | { error: string };

export type DevLine = { payload: string; signature: string; hook: "callback" };

/** A dev-mode `/route-metadata` response held open until every key of its batch has had its line. */
export type DevStream = { res: ServerResponse; pending: Set<string> };

type Entry = { registration: Registration; stream: DevStream | null };

/**
 * The rendezvous points between requests that wait on each other: a PUT waits for its key's registration
 * (in dev mode it can overtake `/route-metadata`), and a finished PUT waits for the app's `/callback-result`.
 * Every wait is bounded, and registrations expire, so an abandoned upload leaves nothing behind.
 */
export class CallbackRegistry {
  private readonly entries = new Map<string, Entry>();
  private readonly registrationWaiters = new Map<string, Set<(entry: Entry | null) => void>>();
  private readonly resultWaiters = new Map<string, (outcome: CallbackOutcome) => void>();
  private readonly timers = new Set<NodeJS.Timeout>();
  private readonly streams = new Set<DevStream>();

  constructor(private readonly ttlMs: number) {}

  register(keys: string[], registration: Registration, devResponse?: ServerResponse) {
    const stream = devResponse ? { res: devResponse, pending: new Set(keys) } : null;
    if (stream) {
      this.streams.add(stream);
      devResponse?.on("close", () => this.streams.delete(stream));
      if (keys.length === 0) this.endStream(stream);
    }
    const entry: Entry = { registration, stream };
    for (const key of keys) {
      this.entries.set(key, entry);
      const waiters = this.registrationWaiters.get(key);
      this.registrationWaiters.delete(key);
      waiters?.forEach((wake) => wake(entry));
    }
    this.after(this.ttlMs, () => {
      for (const key of keys) if (this.entries.get(key) === entry) this.entries.delete(key);
      if (stream) this.endStream(stream);
    });
  }

  /** The key's registration, waiting up to `maxMs` for it to arrive; it is handed out once. */
  async take(key: string, maxMs: number): Promise<{ registration: Registration; stream: DevStream | null } | null> {
    let entry = this.entries.get(key) ?? null;
    if (!entry) {
      entry = await new Promise<Entry | null>((resolve) => {
        const waiters = this.registrationWaiters.get(key) ?? new Set();
        this.registrationWaiters.set(key, waiters);
        const wake = (found: Entry | null) => {
          clearTimeout(timer);
          this.timers.delete(timer);
          waiters.delete(wake);
          if (waiters.size === 0 && this.registrationWaiters.get(key) === waiters) this.registrationWaiters.delete(key);
          resolve(found);
        };
        const timer = this.after(maxMs, () => wake(null));
        waiters.add(wake);
      });
    }
    if (entry) this.entries.delete(key);
    return entry;
  }

  /** Writes one JSON line for `key` on its dev stream, ending the stream after the batch's last key. */
  sendDevLine(stream: DevStream, key: string, line: DevLine): boolean {
    if (!this.streams.has(stream) || stream.res.writableEnded || stream.res.destroyed) return false;
    stream.res.write(`${JSON.stringify(line)}\n`);
    stream.pending.delete(key);
    if (stream.pending.size === 0) this.endStream(stream);
    return true;
  }

  /** Starts waiting for the app's result for `key` before the callback goes out, so no answer can be missed. */
  expectResult(key: string, maxMs: number): Promise<CallbackOutcome> {
    return new Promise((resolve) => {
      const timer = this.after(maxMs, () => this.settle(key, { serverData: null }));
      this.resultWaiters.set(key, (outcome) => {
        clearTimeout(timer);
        this.timers.delete(timer);
        resolve(outcome);
      });
    });
  }

  /** Hands a result to whoever waits for `key`; false when nobody does (late, duplicate or unknown). */
  settle(key: string, outcome: CallbackOutcome): boolean {
    const waiter = this.resultWaiters.get(key);
    if (!waiter) return false;
    this.resultWaiters.delete(key);
    waiter(outcome);
    return true;
  }

  /** Releases everything at shutdown: held PUTs answer with no server data, open streams end. */
  close() {
    for (const timer of this.timers) clearTimeout(timer);
    this.timers.clear();
    for (const key of [...this.resultWaiters.keys()]) this.settle(key, { serverData: null });
    for (const waiters of this.registrationWaiters.values()) [...waiters].forEach((wake) => wake(null));
    for (const stream of [...this.streams]) this.endStream(stream);
    this.entries.clear();
  }

  private endStream(stream: DevStream) {
    this.streams.delete(stream);
    if (!stream.res.writableEnded) stream.res.end();
  }

  private after(ms: number, run: () => void): NodeJS.Timeout {
    const timer = setTimeout(() => {
      this.timers.delete(timer);
      run();
    }, ms);
    timer.unref();
    this.timers.add(timer);
    return timer;
  }
}
