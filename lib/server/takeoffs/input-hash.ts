import { createHash } from "node:crypto";
import type { TakeoffInputs, TakeoffPrices } from "@/takeoff";

/**
 * Bumped whenever the engine can compute a different result from the same inputs (a new rounding, a
 * better board plan): results stored under an older version are then never reused.
 */
export const TAKEOFF_ENGINE_VERSION = "2026-12-02.5"; // .2 exact money sums; .3 never worse than first-fit decreasing; .4 extensions planned along ripped strips

/**
 * What a takeoff result depends on, hashed: the engine version, the snapshots of the window list, counts
 * and settings, and the prices. The snapshots are built in a fixed key and row order, so the same
 * project state always gives the same JSON; a different order would only miss the reuse, never mix results.
 */
export function takeoffInputHash(inputs: TakeoffInputs, prices: TakeoffPrices): string {
  return createHash("sha256").update(JSON.stringify([TAKEOFF_ENGINE_VERSION, inputs, prices])).digest("hex");
}
