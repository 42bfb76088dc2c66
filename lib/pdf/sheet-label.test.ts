import { describe, expect, it } from "vitest";
import { pickSheetLabel, sheetNumbersIn, type TextOnSheet } from "./sheet-label";

describe("sheetNumbersIn", () => {
  it("finds the usual sheet-number shapes", () => {
    expect(sheetNumbersIn("A-201")).toEqual(["A-201"]);
    expect(sheetNumbersIn("A201")).toEqual(["A201"]);
    expect(sheetNumbersIn("A2.01")).toEqual(["A2.01"]);
    expect(sheetNumbersIn("A-101.1")).toEqual(["A-101.1"]);
    expect(sheetNumbersIn("SHEET AD-1.01 OF 40")).toEqual(["AD-1.01"]);
  });

  it("ignores window marks, grid bubbles, dimensions, dates and cross-references", () => {
    for (const text of ["W1", "W12", "A1", "B-2", `12'-7 1/2"`, "2026-02-09", "PROJECT NO. 24-117", "3/A-501", "UNIT A-2016X", "ASTM C1396.5.2"]) {
      expect(sheetNumbersIn(text), text).toEqual([]);
    }
  });
});

const at = (text: string, size: number, x: number, y: number): TextOnSheet => ({ text, size, x, y });

describe("pickSheetLabel", () => {
  it("prefers the largest sheet number", () => {
    expect(pickSheetLabel([at("SEE A-501", 8, 0.9, 0.95), at("A-201", 36, 0.5, 0.5)])).toBe("A-201");
  });

  it("breaks near-ties by closeness to the bottom-right corner as displayed", () => {
    expect(pickSheetLabel([at("A-999", 30, 0.05, 0.05), at("A-201", 32, 0.95, 0.97)])).toBe("A-201");
    expect(pickSheetLabel([at("A-201", 32, 0.95, 0.97), at("A-999", 34, 0.05, 0.05)])).toBe("A-201");
  });

  it("is null when no text looks like a sheet number", () => {
    expect(pickSheetLabel([])).toBeNull();
    expect(pickSheetLabel([at("UNIT TYPE A — FLOOR PLAN", 10, 0.9, 0.9)])).toBeNull();
  });
});
