import { describe, expect, it } from "vitest";
import { columnForField, errorsByColumn } from "./columns";

describe("server field errors → cells", () => {
  it.each([
    ["width", "width"],
    ["trimSpec.reveal", "reveal"],
    ["trimSpec.casingThickness", "casing"],
    ["trimSpec.apronReturns", "apron"],
    ["wallBuildUp.frameDepth", "setback"],
    ["version", null],
    ["_", null],
  ])("%s → %s", (key, column) => {
    expect(columnForField(key)).toBe(column);
  });

  it("joins two messages for one cell and keeps the rest for the row", () => {
    expect(
      errorsByColumn({ "trimSpec.casingWidth": "Too wide.", "trimSpec.casingThickness": "Too thin.", _: "Nothing to change." }),
    ).toEqual({ casing: "Too wide. Too thin.", row: "Nothing to change." });
  });
});
