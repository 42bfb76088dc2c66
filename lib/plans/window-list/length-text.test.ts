import { describe, expect, it } from "vitest";
import { readLength, splitCasing, tape } from "./length-text";

describe("tape", () => {
  it.each([
    [25.875, `2'-1 7/8"`],
    [36, `3'-0"`],
    [59.5, `4'-11 1/2"`],
    [23.9375, `23 15/16"`],
    [4.5625, `4 9/16"`],
    [0.125, `1/8"`],
    [0, `0"`],
  ])("%d in → %s", (inches, text) => {
    expect(tape(inches)).toBe(text);
  });

  // Regression: a 3/32" reveal read as 1/8" in the window list while the takeoff used 3/32".
  it.each([
    [3 / 32, `3/32"`],
    [5 / 32, `5/32"`],
    [15 / 64, `15/64"`],
    [1 + 3 / 64, `1 3/64"`],
  ])("a short length on a finer mark shows exactly: %d in → %s", (inches, text) => {
    expect(tape(inches)).toBe(text);
  });

  it("a short length off the 1/64 grid (2.5 mm) still reads to the nearest 1/16", () => {
    expect(tape(2.5 / 25.4)).toBe(`1/8"`);
  });

  it("goes to feet-inches when rounding carries a length to two feet", () => {
    expect(tape(23.99)).toBe(`2'-0"`);
    expect(tape(23.96875)).toBe(`2'-0"`);
    expect(tape(23.96)).toBe(`23 15/16"`);
  });
});

describe("readLength", () => {
  it.each([
    ["25 7/8", 25.875],
    [`2'-1 7/8"`, 25.875],
    ["635 mm", 25],
    ["  35 1/2  ", 35.5],
    ["0", 0],
  ])("reads %s", (text, inches) => {
    expect(readLength(text, "Width", { allowZero: true })).toEqual({ ok: true, inches });
  });

  it("names the field and shows how to write a length", () => {
    expect(readLength("two feet", "Width")).toEqual({ ok: false, message: `Width: write a length such as 35 1/2, 2'-11 1/2" or 902 mm.` });
  });

  it("refuses zero unless allowed", () => {
    expect(readLength("0", "Width")).toEqual({ ok: false, message: "Width must be more than zero." });
  });
});

describe("splitCasing", () => {
  it.each([
    ["2 1/2 x 11/16", ["2 1/2", "11/16"]],
    [`2-1/2" × 11/16"`, [`2-1/2"`, `11/16"`]],
    ["2.5x.6875", ["2.5", ".6875"]],
    ["64 mm by 18 mm", ["64 mm", "18 mm"]],
  ])("splits %s", (text, parts) => {
    expect(splitCasing(text)).toEqual(parts);
  });

  it.each(["2 1/2", "2 x", "1 x 2 x 3", ""])("refuses %j", (text) => {
    expect(splitCasing(text)).toBeNull();
  });
});
