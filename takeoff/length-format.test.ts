import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { formatLength } from "./length-format";
import { Q } from "./testing/rational";

describe("formatLength", () => {
  it.each([
    [25.875, '25 7/8"'],
    [0.5, '1/2"'],
    [12, '12"'],
    [47.0625, '47 1/16"'],
    [0, '0"'],
    [10.25, '10 1/4"'],
  ])("%d → %s", (inches, text) => {
    expect(formatLength(inches)).toBe(text);
  });

  it.each([
    [25.875, `2'-1 7/8"`],
    [36, `3'-0"`],
    [7.5, `0'-7 1/2"`],
    [35.97, `3'-0"`],
    [143.99, `12'-0"`],
  ])("feet-inches %d → %s (a value rounding up to a whole foot carries over)", (inches, text) => {
    expect(formatLength(inches, { style: "feet-inches" })).toBe(text);
  });

  it("rounds to the nearest 1/16 with an exact half going up", () => {
    expect(formatLength(1 / 32)).toBe('1/16"');
    expect(formatLength(25.84375)).toBe('25 7/8"'); // 25 27/32 is halfway between 25 13/16 and 25 7/8
    expect(formatLength(25.84)).toBe('25 13/16"');
  });

  it("writes the fraction in lowest terms and matches a BigInt rounding of the value", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 2000, noNaN: true }), (x) => {
        const text = formatLength(x);
        const m = /^(?:(\d+) )?(?:(\d+)\/(\d+))?"$|^(\d+)"$/.exec(text);
        expect(m).not.toBeNull();
        const whole = BigInt(m?.[1] ?? m?.[4] ?? "0");
        const num = BigInt(m?.[2] ?? "0");
        const den = BigInt(m?.[3] ?? "1");
        if (m?.[2]) {
          expect([2n, 4n, 8n, 16n]).toContain(den);
          expect(num % 2n).toBe(1n); // odd numerator: reduced
        }
        expect(new Q(whole * den + num, den).eq(Q.decimal(String(x)).nearestSixteenth())).toBe(true);
      }),
      { numRuns: 300 },
    );
  });

  it("throws on non-finite input", () => {
    expect(() => formatLength(Number.POSITIVE_INFINITY)).toThrow(/finite/);
  });
});
