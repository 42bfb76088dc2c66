/**
 * The worker threads that run pdf.js over uploads. Each inspection gets a fresh worker (a hostile file
 * leaves nothing behind for the next one), a heap limit, and a hard deadline after which the worker is
 * terminated — pdf.js can spin in one synchronous call, which no timer on its own thread could interrupt.
 */
import { existsSync } from "node:fs";
import { availableParallelism } from "node:os";
import path from "node:path";
import { Tinypool } from "tinypool";
import type { TextOnSheet } from "./sheet-label";

/** What inspect-worker.mjs answers (kept in step with its JSDoc types). */
export type WorkerAnswer =
  | {
      ok: true;
      pageCount: number;
      pages: { pageNumber: number; width: number; height: number; rotation: number; userUnit: number; text: TextOnSheet[] }[];
    }
  | { ok: false; reason: "decoded-too-large"; decodedBytes: number }
  | { ok: false; reason: "empty" | "too-slow" | "encrypted" | "unreadable" }
  | { ok: false; reason: "too-many-pages"; pages: number };

export class WorkerFailed extends Error {
  constructor(
    readonly kind: "deadline" | "memory" | "crashed",
    options?: { cause?: unknown },
  ) {
    super(`PDF inspection worker: ${kind}`, options);
  }
}

/** Heap for one inspection. pdf.js keeps decoded streams outside the heap; the decoded-bytes caps bound those. */
const WORKER_HEAP_MB = 512;

/**
 * The worker is loaded from disk as plain JavaScript, so it is found from the project root: `next start`,
 * vitest and tsx all run there. Bundlers never see it (Next's file tracing is told to keep it, see
 * next.config.mjs), and a deployment that starts elsewhere points MITERWISE_ROOT at the app folder.
 */
export function workerFile(): string {
  const file = path.join(process.env.MITERWISE_ROOT ?? process.cwd(), "lib", "pdf", "inspect-worker.mjs");
  if (!existsSync(file)) throw new Error(`The PDF inspection worker is missing at ${file}; start the server from the app folder.`);
  return file;
}

let pool: Tinypool | null = null;

function thePool(): Tinypool {
  pool ??= new Tinypool({
    filename: workerFile(),
    // One core stays free for requests on a small machine; uploads wait their turn in the queue.
    maxThreads: Math.max(1, Math.min(4, availableParallelism() - 1)),
    minThreads: 0,
    isolateWorkers: true,
    idleTimeout: 10_000,
    resourceLimits: { maxOldGenerationSizeMb: WORKER_HEAP_MB, maxYoungGenerationSizeMb: 64 },
  });
  return pool;
}

export async function runInspection(
  bytes: Uint8Array,
  limits: { maxPages: number; timeoutMs: number; maxDecodedStreamBytes: number; maxDecodedBytes: number },
): Promise<WorkerAnswer> {
  // The worker gets its own copy, moved rather than cloned; the caller's bytes stay usable.
  const copy = bytes.slice();
  const signal = AbortSignal.timeout(limits.timeoutMs);
  const task = {
    bytes: copy,
    limits: {
      maxPages: limits.maxPages,
      maxDecodedStreamBytes: limits.maxDecodedStreamBytes,
      maxDecodedBytes: limits.maxDecodedBytes,
      deadline: Date.now() + limits.timeoutMs,
    },
  };
  try {
    return (await thePool().run(task, { signal, transferList: [copy.buffer] })) as WorkerAnswer;
  } catch (error) {
    if (signal.aborted) throw new WorkerFailed("deadline", { cause: error });
    const code = (error as { code?: string } | null)?.code;
    if (code === "ERR_WORKER_OUT_OF_MEMORY") throw new WorkerFailed("memory", { cause: error });
    throw new WorkerFailed("crashed", { cause: error });
  }
}
