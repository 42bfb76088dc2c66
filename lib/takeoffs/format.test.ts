import { describe, expect, it } from "vitest";
import { feet, hours, percent, ratioPercent, stockLength, tapeLength, usd } from "./format";
import { endsText, PART_LABELS } from "./labels";

describe("money and figures", () => {
  it.each([
    [0, "$0.00"],
    [1234.5, "$1,234.50"],
    [0.005, "$0.01"],
    [-0.001, "$0.00"],
    [98765.432, "$98,765.43"],
    [-12.5, "-$12.50"],
    [-1234.567, "-$1,234.57"],
    // Half up toward +∞, as the engine rounds money (roundToCents): −0.125 → −0.12.
    [-0.125, "-$0.12"],
    [0.125, "$0.13"],
    // In binary floating point 1.005 × 100 is 100.49999999999999 and 0.145 × 100 is 14.499999999999998:
    // Math.round(x * 100) printed $1.00 and $0.14.
    [1.005, "$1.01"],
    [0.145, "$0.15"],
    [2.675, "$2.68"],
    [1234567.894, "$1,234,567.89"],
    [98765432109.995, "$98,765,432,110.00"],
  ])("usd(%s) = %s", (amount, text) => expect(usd(amount)).toBe(text));

  it("reads lengths like a tape, stock in whole feet", () => {
    expect(tapeLength(62.625)).toBe(`5'-2 5/8"`);
    expect(tapeLength(0.6875)).toBe(`11/16"`);
    expect(tapeLength(11.99)).toBe(`1'-0"`);
    expect(tapeLength(7.5)).toBe(`7 1/2"`);
    expect(stockLength(144)).toBe("12'");
    expect(stockLength(100)).toBe(`8'-4"`);
  });

  it("rounds feet, percents and hours to one decimal", () => {
    expect(feet(436.625)).toBe("436.6");
    expect(feet(-0.01)).toBe("0.0");
    expect(ratioPercent(0.89474)).toBe("89.5 %");
    expect(percent(2.345)).toBe("2.3 %");
    expect(hours(1155)).toBe("19.3 h");
  });
});

describe("labels", () => {
  it("names parts and ends in words", () => {
    expect(PART_LABELS["extension-side"]).toBe("Jamb extension, side");
    expect(endsText(["square", "miter"])).toBe("Square / Miter (long point)");
    expect(endsText(["return", "return"])).toBe("Return miter, both ends");
  });
});
