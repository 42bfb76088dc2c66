import fc from "fast-check";
import highsLoader from "highs";
import { describe, expect, it } from "vitest";
import { boundedKnapsack } from "./knapsack";

const instance = fc.record({
  items: fc.array(
    fc.record({ w: fc.integer({ min: 1, max: 40 }), v: fc.integer({ min: 0, max: 1000 }).map((x) => x / 8), b: fc.integer({ min: 0, max: 6 }) }),
    { minLength: 1, maxLength: 4 },
  ),
  cap: fc.integer({ min: 1, max: 120 }),
});

function bruteForce(items: { w: number; v: number; b: number }[], cap: number): number {
  let best = 0;
  const walk = (i: number, room: number, value: number) => {
    if (i === items.length) {
      best = Math.max(best, value);
      return;
    }
    const it = items[i]!;
    for (let k = 0; k <= it.b && k * it.w <= room; k++) walk(i + 1, room - k * it.w, value + k * it.v);
  };
  walk(0, cap, 0);
  return best;
}

describe("bounded knapsack", () => {
  it("matches brute-force enumeration, and its read-back choice is feasible and optimal", () => {
    fc.assert(
      fc.property(instance, ({ items, cap }) => {
        const k = boundedKnapsack(items.map((i) => i.w), items.map((i) => i.v), items.map((i) => i.b), cap);
        for (const c of [cap, Math.floor(cap / 2), 1]) {
          const want = bruteForce(items, c);
          expect(k.value(c)).toBe(want);
          const counts = k.counts(c);
          let weight = 0;
          let value = 0;
          items.forEach((it, i) => {
            expect(counts[i]).toBeLessThanOrEqual(it.b);
            weight += (counts[i] ?? 0) * it.w;
            value += (counts[i] ?? 0) * it.v;
          });
          expect(weight).toBeLessThanOrEqual(c);
          expect(value).toBe(want);
        }
      }),
      { numRuns: 300 },
    );
  });

  it("agrees with the HiGHS MIP (highs package) on larger instances, bounded and unbounded", async () => {
    const highs = await highsLoader();
    fc.assert(
      fc.property(
        fc.array(fc.record({ w: fc.integer({ min: 20, max: 900 }), v: fc.integer({ min: 1, max: 5000 }) }), { minLength: 2, maxLength: 12 }),
        fc.integer({ min: 900, max: 3072 }),
        fc.boolean(),
        (items, cap, bounded) => {
          const b = items.map((it) => (bounded ? 1 + (it.w % 3) : 10_000));
          const k = boundedKnapsack(items.map((i) => i.w), items.map((i) => i.v), b, cap);
          const lp = [
            "Maximize",
            ` value: ${items.map((it, i) => `${it.v} x${i}`).join(" + ")}`,
            "Subject To",
            ` room: ${items.map((it, i) => `${it.w} x${i}`).join(" + ")} <= ${cap}`,
            "Bounds",
            ...items.map((_, i) => ` 0 <= x${i} <= ${b[i]}`),
            "General",
            ` ${items.map((_, i) => `x${i}`).join(" ")}`,
            "End",
          ].join("\n");
          const r = highs.solve(lp, { output_flag: false, mip_rel_gap: 0 });
          expect(r.Status).toBe("Optimal");
          expect(k.value(cap)).toBeCloseTo(r.ObjectiveValue, 6);
        },
      ),
      { numRuns: 25 },
    );
  });

  it("takes zero-weight items up to their bound for free", () => {
    const k = boundedKnapsack([0, 5], [2, 3], [4, 10], 10);
    expect(k.value(10)).toBe(8 + 6);
    expect(Array.from(k.counts(10))).toEqual([4, 2]);
  });
});
