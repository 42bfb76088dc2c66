import type { IncomingMessage } from "node:http";

/**
 * One writer per file key. Two PUTs for one key would interleave bytes in the partial file, so they take turns;
 * a newer PUT also cuts off an older one still holding the key (a paused browser upload whose socket lingers),
 * because the client that resumes is the one that knows the current resume point.
 */
export class KeyLocks {
  private readonly tails = new Map<string, { done: Promise<void>; owner: IncomingMessage }>();

  /** Must be called synchronously on arrival, so a HEAD that comes later always sees this PUT as in flight. */
  run<T>(key: string, owner: IncomingMessage, task: () => Promise<T>): Promise<T> {
    const previous = this.tails.get(key);
    if (previous && !previous.owner.complete) previous.owner.destroy();
    const result = (previous?.done ?? Promise.resolve()).then(task);
    const done = result.then(
      () => undefined,
      () => undefined,
    );
    const entry = { done, owner };
    this.tails.set(key, entry);
    void done.then(() => {
      if (this.tails.get(key) === entry) this.tails.delete(key);
    });
    return result;
  }

  /** Waits (at most `maxMs`) for the key's writer to finish, so a resume point is read after the bytes settle. */
  async idle(key: string, maxMs: number): Promise<void> {
    const current = this.tails.get(key);
    if (!current) return;
    let timer: NodeJS.Timeout | undefined;
    await Promise.race([current.done, new Promise<void>((resolve) => (timer = setTimeout(resolve, maxMs)))]);
    clearTimeout(timer);
  }
}
