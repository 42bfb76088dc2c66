import { describe, expect, it } from "vitest";
import { Fraction } from "../exact";
import { layoutBound } from "./rip-bound";

const of = (width: number, bound: number) => ({ width, bound: new Fraction(bound) });

describe("the order's bound from weights on its strip widths", () => {
  it("derived: one width weighs 1/n a strip, so the bound is the strips' bound / n", () => {
    // 3/4" strips, four to a 3 1/2" board at 1/8" rip kerf: $40 of strips at board price → $10 of boards.
    expect(layoutBound([of(0.75, 40)], 3.5, 0.125)!.valueOf()).toBe(10);
  });

  it("derived: strips wider than half the face each need a board; the 1 3/16\" ones pair up beside them or with each other", () => {
    // The bench's three setbacks from a 3 1/2" 1x4 at 1/8" kerf. Layouts: {3 5/16"}, {1 7/8", 1 3/16"},
    // {1 3/16", 1 3/16"} (3.3125 + 0.125 + 1.1875 > 3.5; 2 × 1.875 + 0.125 > 3.5). Weights f = (1, 1/2, 1/2)
    // are feasible, and with more 1 3/16" than 1 7/8" strips they are the best: 30 + (20 + 36) / 2 = 58.
    expect(layoutBound([of(3.3125, 30), of(1.875, 20), of(1.1875, 36)], 3.5, 0.125)!.valueOf()).toBe(58);
    // With fewer 1 3/16" than 1 7/8" strips the weights (1, 1, 0) are best: 30 + 20.
    expect(layoutBound([of(3.3125, 30), of(1.875, 20), of(1.1875, 12)], 3.5, 0.125)!.valueOf()).toBe(50);
  });

  it("derived: 1 1/2\" and 3/4\" strips from a 3 1/2\" board — weights (1/2, 1/4) — never above the packing itself", () => {
    // Layouts: {1.5, 1.5}, {1.5, 0.75, 0.75}, {0.75 × 4}: f = (1/2, 1/4) makes each weigh exactly 1.
    // $10 of 1 1/2" strips and $10 of 3/4" strips: 10/2 + 10/4 = 7.5.
    expect(layoutBound([of(1.5, 10), of(0.75, 10)], 3.5, 0.125)!.valueOf()).toBe(7.5);
  });

  it("leaves out a width wider than the board (the caller charges it a board each)", () => {
    expect(layoutBound([of(3.51, 9), of(0.75, 40)], 3.5, 0.125)!.valueOf()).toBe(10);
  });
});
