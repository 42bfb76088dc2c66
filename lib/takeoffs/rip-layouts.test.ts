import { describe, expect, it } from "vitest";
import { cutsText, layoutText, leftText, patternText, ripWidthsText, stripCutGroups, stripGroupTitle } from "./rip-layouts";
import { crosscutOrder, rippedOrder } from "./testing/board-orders";

describe("ripped board orders in words", () => {
  it("names which strips come from which boards", () => {
    const [a, b] = rippedOrder().rip!.layouts!;
    expect(layoutText(a!)).toBe(`12 × 16' boards, each ripped to 1 1/2" + 3/4" + 3/4" (2 1/8" left)`);
    expect(layoutText(b!)).toBe(`1 × 12' board, ripped to 1 1/2" + 1 1/2" + 3/4" (1 3/8" left)`);
  });

  it("says what is left of the board's width, even when it rounds away", () => {
    expect(leftText(0.25)).toBe(`1/4" left`);
    expect(leftText(0)).toBe("nothing left");
    expect(leftText(-1e-12)).toBe("nothing left");
    expect(leftText(0.01)).toBe(`under 1/32" left`);
  });

  it("lists an order's strip widths, or its one rip width, or nothing for boards used whole", () => {
    expect(ripWidthsText(rippedOrder())).toBe(`1 1/2", 3/4"`);
    expect(ripWidthsText(rippedOrder({ widths: undefined, width: 1.4375 }))).toBe(`1 7/16"`);
    expect(ripWidthsText(crosscutOrder())).toBeNull();
  });

  it("counts repeated cuts along a strip, longest first as the plan gives them", () => {
    expect(cutsText([60.75, 60.75, 36])).toBe(`2 × 5'-0 3/4" + 3'-0"`);
    expect(cutsText([41.25, 0.6875, 0.6875, 0.6875])).toBe(`3'-5 1/4" + 3 × 11/16"`);
  });

  it("groups the crosscuts by strip width and stock length, with the strips left over", () => {
    const groups = stripCutGroups(rippedOrder());
    expect(groups.map((g) => [stripGroupTitle(g), g.strips, g.patterns.map(patternText), g.spare])).toEqual([
      [`1 1/2" strips from 16' boards`, 12, [`10 strips: 2 × 5'-0 3/4" + 3'-0" (2'-10 1/8" offcut)`, `2 strips: 5'-0 3/4" (10'-11 1/8" offcut)`], 0],
      [`1 1/2" strips from 12' boards`, 2, [`2 strips: 2 × 5'-0 3/4" (1'-10 1/4" offcut)`], 0],
      [`3/4" strips from 16' boards`, 24, [`20 strips: 5 × 3'-0" (11 3/8" offcut)`], 4],
      [`3/4" strips from 12' boards`, 1, [`1 strip: 2 × 3'-0" (5'-11 3/4" offcut)`], 0],
    ]);
    // Every strip the plan cuts along comes out of a layout: nothing is cut from strips never ripped.
    for (const g of groups) expect(g.patterns.reduce((t, p) => t + p.count, 0)).toBeLessThanOrEqual(g.strips);
  });

  it("leaves single-width and older ripped orders (no layouts) and whole-board orders as they were", () => {
    const old = rippedOrder({ widths: undefined, width: 1.4375 });
    old.rip = { ...old.rip!, layouts: undefined };
    expect(stripCutGroups(old)).toEqual([]);
    expect(stripCutGroups(crosscutOrder())).toEqual([]);
  });
});
