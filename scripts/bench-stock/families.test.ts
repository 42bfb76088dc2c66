import { describe, expect, it } from "vitest";
import { cutgen, triplet, uniform } from "./families";
import { firstFitDecreasingBoards } from "./ffd";

describe("benchmark families", () => {
  it("triplets: every size between 250 and 500, the total exactly fills the optimum's boards", () => {
    for (const seed of [1, 2, 3]) {
      const inst = triplet(20, seed);
      const sizes = inst.demand.flatMap((d) => Array<number>(d.quantity).fill(d.length));
      expect(sizes).toHaveLength(60);
      expect(sizes.every((s) => s >= 250 && s <= 500)).toBe(true);
      expect(sizes.reduce((a, b) => a + b, 0)).toBe(inst.optimum! * inst.stockLength);
    }
  });

  it("uniform: sizes on [20, 100] against 150; CUTGEN: sizes within [v1·L, v2·L]", () => {
    const u = uniform(120, 7);
    expect(u.demand.every((d) => d.length >= 20 && d.length <= 100)).toBe(true);
    expect(u.demand.reduce((t, d) => t + d.quantity, 0)).toBe(120);
    const c = cutgen(20, 0.1, 0.8, 10, 3);
    expect(c.demand.every((d) => d.length >= 100 && d.length <= 800 && d.quantity >= 1)).toBe(true);
  });

  it("first-fit decreasing, by hand (derived): 60, 50, 40, 30, 20 into 100 → [60 40] [50 30 20] = 2 boards; 6 × 51 → 6", () => {
    expect(firstFitDecreasingBoards([60, 50, 40, 30, 20].map((length) => ({ length, quantity: 1 })), 100)).toBe(2);
    expect(firstFitDecreasingBoards([{ length: 51, quantity: 6 }], 100)).toBe(6);
  });
});
