import { describe, expect, it } from "vitest";
import type { OpeningTypeView } from "@/lib/plans/api-types";
import { planCellPatch } from "./cell-patch";

const row: OpeningTypeView = {
  id: "8d6b1f5e-3f7a-4d0c-9a51-2b9e4c7d1a10",
  mark: "W2",
  width: 35.5,
  height: 59.5,
  setback: 4.5625,
  wallBuildUp: null,
  trimSpec: { style: "stool-and-apron", casingWidth: 2.5, casingThickness: 0.6875 },
  notes: null, kind: "window", shape: null,
  version: 3,
};

describe("planCellPatch", () => {
  it.each([
    [{ column: "width", text: "36 1/4" }, { version: 3, width: 36.25 }],
    [{ column: "height", text: `5'-0"` }, { version: 3, height: 60 }],
    [{ column: "setback", text: "116 mm" }, { version: 3, setback: 116 / 25.4 }],
    [{ column: "mark", text: " W2a " }, { version: 3, mark: "W2a" }],
    [{ column: "notes", text: "Bath, obscure glass" }, { version: 3, notes: "Bath, obscure glass" }],
    [{ column: "casing", text: "3 1/4 x 3/4" }, { version: 3, trimSpec: { casingWidth: 3.25, casingThickness: 0.75 } }],
    [{ column: "reveal", text: "3/16" }, { version: 3, trimSpec: { reveal: 0.1875 } }],
    [{ column: "horn", text: "1" }, { version: 3, trimSpec: { stoolHorn: 1 } }],
    [{ column: "extension", text: "5/8" }, { version: 3, trimSpec: { extensionThickness: 0.625 } }],
    [{ column: "style", style: "picture-frame" }, { version: 3, trimSpec: { style: "picture-frame" } }],
    [{ column: "apron", text: "1/2", returns: true }, { version: 3, trimSpec: { apronInset: 0.5 } }],
    [{ column: "apron", text: "", returns: false }, { version: 3, trimSpec: { apronReturns: false } }],
  ] as const)("%j → PATCH body", (edit, body) => {
    expect(planCellPatch(row, edit)).toEqual({ kind: "send", body });
  });

  it.each([
    { column: "width", text: `2'-11 1/2"` },
    { column: "width", text: "" + `2'-11 1/2"  ` },
    { column: "reveal", text: "" },
    { column: "style", style: "stool-and-apron" },
    { column: "apron", text: "", returns: true },
  ] as const)("sends nothing when %j leaves the row as it was", (edit) => {
    expect(planCellPatch(row, edit)).toEqual({ kind: "unchanged" });
  });

  it.each([
    [{ column: "width", text: "wide" }, "width", `Width: write a length such as 35 1/2, 2'-11 1/2" or 902 mm.`],
    [{ column: "width", text: "0" }, "width", "Width must be more than zero."],
    [{ column: "mark", text: "" }, "mark", "Mark is required."],
    [{ column: "mark", text: "W#2" }, "mark", "Mark may use letters, digits, spaces, dots, dashes and slashes."],
    [{ column: "casing", text: "2 1/2" }, "trimSpec.casingWidth", "Write the casing as width × thickness, e.g. 2 1/2 x 11/16."],
    [{ column: "casing", text: "2 1/2 x thin" }, "trimSpec.casingThickness", `Casing thickness: write a length such as 35 1/2, 2'-11 1/2" or 902 mm.`],
    [{ column: "reveal", text: "3" }, "trimSpec.reveal", "reveal must be less than the casing width"],
    [{ column: "extension", text: "0" }, "trimSpec.extensionThickness", "Extension thickness must be more than zero."],
  ] as const)("refuses %j before sending (%s)", (edit, key, message) => {
    expect(planCellPatch(row, edit)).toEqual({ kind: "invalid", fields: { [key]: message } });
  });

  it("sends the engine default for an emptied trim cell, since a set field cannot be removed", () => {
    const set = { ...row, trimSpec: { ...row.trimSpec, reveal: 0.0625, extensionThickness: 1 } };
    expect(planCellPatch(set, { column: "reveal", text: "" })).toEqual({ kind: "send", body: { version: 3, trimSpec: { reveal: 0.125 } } });
    expect(planCellPatch(set, { column: "extension", text: " " })).toEqual({ kind: "send", body: { version: 3, trimSpec: { extensionThickness: 0.75 } } });
  });

  it("keeps a set horn typed, naming the automatic length", () => {
    const set = { ...row, trimSpec: { ...row.trimSpec, stoolHorn: 1 } };
    expect(planCellPatch(set, { column: "horn", text: "" })).toEqual({
      kind: "invalid",
      fields: { "trimSpec.stoolHorn": `Type a horn length; twice the casing thickness is 1 3/8".` },
    });
  });

  it("checks a new casing width against the reveal already on the row", () => {
    const set = { ...row, trimSpec: { ...row.trimSpec, reveal: 0.5 } };
    expect(planCellPatch(set, { column: "casing", text: "1/2 x 1/2" })).toEqual({
      kind: "invalid",
      fields: { "trimSpec.reveal": "reveal must be less than the casing width" },
    });
  });
});
