import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { formatLength } from "./length-format";
import { parseLength, parseLengthExact } from "./length-parse";
import { Q } from "./testing/rational";

describe("parseLength: lengths as carpenters write them", () => {
  it.each([
    ["25", 25],
    ["25.875", 25.875],
    ["25 7/8", 25.875],
    ["25-7/8", 25.875],
    ["7/8", 0.875],
    ['25 7/8"', 25.875],
    ["2'", 24],
    [`2'-1 7/8"`, 25.875],
    [`2' 1 7/8"`, 25.875],
    [`2'1-7/8"`, 25.875],
    ["2 ft 1 7/8 in", 25.875],
    ["  25 7/8  ", 25.875],
    [`3'-0"`, 36],
    [`0'-7 1/2"`, 7.5],
    ["12 in", 12],
  ])("%s → %d in", (text, inches) => {
    expect(parseLength(text)).toBe(inches);
  });

  // 1 in = 25.4 mm exactly — International Yard and Pound Agreement (1959); NIST Handbook 44 Appendix C.
  it.each([
    ["635 mm", 25],
    ["63.5 cm", 25],
    ["0.635 m", 25],
    ["25.4mm", 1],
    ["1 m", 5000 / 127],
  ])("metric %s → %d in (1 in = 25.4 mm exactly, NIST Handbook 44 Appendix C)", (text, inches) => {
    expect(parseLength(text)).toBe(inches);
  });

  it("converts millimetres exactly: 1 mm = 5/127 in (25.4 mm per inch, 1959 agreement)", () => {
    const f = parseLengthExact("1 mm");
    expect(new Q(f.s * f.n, f.d).eq(new Q(10n, 254n))).toBe(true);
  });

  it.each(["", "   ", "abc", "two feet", "7/8/9", "1/0", "25 0/0", "2'-", '"', "1..5", "-3", "25 9/8", "5 furlongs", "3 mm 2"])(
    "throws on %j",
    (text) => {
      expect(() => parseLength(text)).toThrow();
    },
  );

  it("names the problem in the error", () => {
    expect(() => parseLength("")).toThrow(/empty/);
    expect(() => parseLength("3/0")).toThrow(/zero denominator/);
  });

  it("reads back whatever formatLength writes, in both styles (round trip on sixteenths)", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 16 * 12 * 40 }), (sixteenths) => {
        const inches = sixteenths / 16;
        expect(parseLength(formatLength(inches))).toBe(inches);
        expect(parseLength(formatLength(inches, { style: "feet-inches" }))).toBe(inches);
      }),
      { numRuns: 300 },
    );
  });
});
