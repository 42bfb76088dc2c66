import { describe, expect, it } from "vitest";
import { compareSheetNumbers, neighbours, orderSheets } from "./sheet-order";

const sheet = (id: string, label: string, planSetId = "set-1", pageNumber = 1) => ({ id, label, planSetId, pageNumber });

describe("compareSheetNumbers", () => {
  it.each([
    ["A-2", "A-10"],
    ["A-101", "A-110"],
    ["A-9", "A-100"],
    ["a-201", "A-202"],
    ["A-101", "S-101"],
    ["A1.1", "A1.10"],
    ["A-101", "A-101A"],
  ])("%s sorts before %s", (a, b) => {
    expect(compareSheetNumbers(a, b)).toBeLessThan(0);
    expect(compareSheetNumbers(b, a)).toBeGreaterThan(0);
  });

  it("treats case and surrounding spaces as the same number", () => {
    expect(compareSheetNumbers("a-101", " A-101")).toBe(0);
  });
});

describe("orderSheets", () => {
  it("orders by sheet number inside a plan set and keeps plan sets in upload order", () => {
    const given = [
      sheet("1", "A-110", "old", 1),
      sheet("2", "A-10", "old", 2),
      sheet("3", "A-101", "old", 3),
      sheet("4", "A-2", "old", 4),
      sheet("5", "A-1", "new", 1),
    ];
    expect(orderSheets(given).map((s) => s.label)).toEqual(["A-2", "A-10", "A-101", "A-110", "A-1"]);
  });

  it("breaks ties between equal numbers by page, and leaves its input alone", () => {
    const given = [sheet("b", "A-101", "s", 7), sheet("a", "A-101", "s", 2)];
    expect(orderSheets(given).map((s) => s.id)).toEqual(["a", "b"]);
    expect(given.map((s) => s.id)).toEqual(["b", "a"]);
  });
});

describe("neighbours", () => {
  const list = [sheet("a", "A-1"), sheet("b", "A-2"), sheet("c", "A-3")];
  it("gives the sheets either side", () => expect(neighbours(list, "b")).toEqual({ previous: list[0], next: list[2] }));
  it("stops at the ends", () => {
    expect(neighbours(list, "a").previous).toBeNull();
    expect(neighbours(list, "c").next).toBeNull();
  });
  it("knows nothing of a sheet not in the list", () => expect(neighbours(list, "z")).toEqual({ previous: null, next: null }));
});
