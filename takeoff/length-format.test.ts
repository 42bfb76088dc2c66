import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { formatLength, formatLengthExact } from "./length-format";
import { parseLength } from "./length-parse";
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

describe("formatLengthExact (what an edit form starts with)", () => {
  it.each([
    [3 / 32, '3/32"'],
    [5 / 32, '5/32"'],
    [0.125, '1/8"'],
    [15 / 64, '15/64"'],
    [2 + 11 / 16, '2 11/16"'],
    [0.75, '3/4"'],
    [36, '36"'],
    [0, '0"'],
    [-3 / 32, '-3/32"'],
  ])("%d → %s", (inches, text) => {
    expect(formatLengthExact(inches)).toBe(text);
  });

  it("writes a value off the 1/64 grid (typed in millimetres) as decimal inches", () => {
    expect(formatLengthExact(2.5 * (5 / 127))).toBe('0.09842519685039369"');
    expect(formatLengthExact(1.5e-7)).toBe('0.00000015"');
  });

  it("reads back as exactly the same number: store → show → save untouched → same value", () => {
    fc.assert(
      fc.property(
        fc.oneof(
          fc.integer({ min: 0, max: 64 * 200 }).map((n) => n / 64),
          // Down to a millionth of an inch: finer than anything a person types or a saw cuts.
          fc.double({ min: 1e-6, max: 2000, noNaN: true }),
        ),
        (x) => {
          expect(parseLength(formatLengthExact(x))).toBe(x);
        },
      ),
    );
  });
});
