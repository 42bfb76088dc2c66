import { LRUCache } from "lru-cache";
import type { TakeoffInputs, TakeoffPrices, TakeoffResult } from "@/takeoff";

/**
 * A saved takeoff's snapshots (inputs, prices, result) as the JSON text the API sends. They never change
 * once written — a copy or a rerun is a new row — so each app server may keep the text it already made
 * without any invalidation, and the results route skips reading, parsing and re-serialising ~20 KB of
 * JSON per request. Keyed by tenant, project and id; whether the row still exists (and is the caller's)
 * is checked on every request before this is used. Bounded by size (characters ≈ bytes).
 */
const cache = new LRUCache<string, string>({ maxSize: 64 * 1024 * 1024, sizeCalculation: (text) => Math.max(1, text.length) });

const keyOf = (s: { orgId: string; projectId: string }, id: string) => `${s.orgId}/${s.projectId}/${id}`;

/** `"inputs":…,"prices":…,"result":…` — the members, without braces, to splice into the takeoff object. */
export function snapshotMembers(parts: { inputs: TakeoffInputs; prices: TakeoffPrices; result: TakeoffResult }): string {
  return `"inputs":${JSON.stringify(parts.inputs)},"prices":${JSON.stringify(parts.prices)},"result":${JSON.stringify(parts.result)}`;
}

export const cachedSnapshotText = (s: { orgId: string; projectId: string }, id: string) => cache.get(keyOf(s, id));

export function keepSnapshotText(s: { orgId: string; projectId: string }, id: string, text: string) {
  cache.set(keyOf(s, id), text);
}
