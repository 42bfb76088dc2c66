import type { Demand } from "@/takeoff";

/** First-fit decreasing on one stock length, no kerf: the simple rule every plan must at least match (derived). */
export function firstFitDecreasingBoards(demand: readonly Demand[], capacity: number): number {
  const sizes = demand.flatMap((d) => Array<number>(d.quantity).fill(d.length)).sort((a, b) => b - a);
  const free: number[] = [];
  for (const s of sizes) {
    const i = free.findIndex((f) => f >= s);
    if (i === -1) free.push(capacity - s);
    else free[i]! -= s;
  }
  return free.length;
}
