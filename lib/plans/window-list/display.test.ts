import { describe, expect, it } from "vitest";
import type { OpeningTypeView } from "@/lib/plans/api-types";
import { cellText, editText, isDefaultCell } from "./display";

const row: OpeningTypeView = {
  id: "0c7e2a57-91d4-4c53-8f0b-6a2d9e1b3c44",
  mark: "W3",
  width: 25.875,
  height: 47.5,
  setback: 0.75,
  wallBuildUp: null,
  trimSpec: { style: "stool-and-apron", casingWidth: 2.5, casingThickness: 0.6875, reveal: 0.0625 },
  notes: null, kind: "window", shape: null,
  version: 1,
};

describe("window list cells", () => {
  it("show lengths like a tape and defaults as the engine will use them", () => {
    expect(cellText(row, "width")).toBe(`2'-1 7/8"`);
    expect(cellText(row, "setback")).toBe(`3/4"`);
    expect(cellText(row, "casing")).toBe(`2 1/2" × 11/16"`);
    expect(cellText(row, "reveal")).toBe(`1/16"`);
    expect(cellText(row, "horn")).toBe(`1 3/8"`);
    expect(cellText(row, "apron")).toBe("flush, returns");
    expect(cellText(row, "extension")).toBe(`3/4"`);
  });

  it("mark which cells are defaults", () => {
    expect(isDefaultCell(row, "reveal")).toBe(false);
    expect(isDefaultCell(row, "horn")).toBe(true);
    expect(isDefaultCell(row, "extension")).toBe(true);
  });

  it("show a dash, not a default, for stool and apron on a picture frame", () => {
    const frame = { ...row, trimSpec: { ...row.trimSpec, style: "picture-frame" as const } };
    expect(cellText(frame, "horn")).toBe("—");
    expect(isDefaultCell(frame, "apron")).toBe(false);
  });

  it("start an editor empty for a default so leaving it keeps the default", () => {
    expect(editText(row, "horn")).toBe("");
    expect(editText(row, "reveal")).toBe(`1/16"`);
    expect(editText(row, "height")).toBe(`3'-11 1/2"`);
  });
});
