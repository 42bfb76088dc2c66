import { describe, expect, it } from "vitest";
import { itemsToCsv, readItemsCsv } from "./csv";
import { planImport } from "./import-plan";
import type { PriceBookItemView } from "./types";

const item = (id: string, over: Partial<PriceBookItemView>): PriceBookItemView => ({
  id,
  version: 1,
  name: "Casing 2 1/2",
  kind: "casing",
  faceWidth: 2.5,
  thickness: 0.6875,
  species: "Poplar",
  supplierCode: null,
  stock: [{ length: 96, price: 10 }],
  ...over,
});
const book = [
  item("a", { name: "Casing 2 1/2", supplierCode: "C-25" }),
  item("b", { name: "Stool 5 1/4", kind: "stool", faceWidth: 5.25, thickness: 0.75 }),
  item("c", { name: "Apron 2 1/2", kind: "apron" }),
];
const HEADER = "name,kind,face_width,thickness,species,supplier_code,price 8'";
const plan = (rows: string[], mode: "merge" | "replace" = "merge") => planImport(book, readItemsCsv([HEADER, ...rows].join("\n")), mode);
const summary = (p: ReturnType<typeof plan>) => p.rows.map((r) => [r.line, r.action, r.itemId, Object.keys(r.diff)]);

describe("planning an import", () => {
  it("exporting and importing a book changes nothing", () => {
    const p = planImport(book, readItemsCsv(itemsToCsv(book)), "replace");
    expect(p.ok).toBe(true);
    expect(p.counts).toEqual({ create: 0, update: 0, unchanged: 3, error: 0, delete: 0 });
  });

  it("matches by supplier code first (a rename), then by name and kind, and creates the rest", () => {
    const p = plan([
      `Casing 2 1/2 primed,casing,2 1/2,11/16,Poplar,c-25,10.00`, // code matches whatever the case
      `stool 5 1/4,stool,5 1/4,3/4,Poplar,,12.50`, // name matches whatever the case; price moved
      `Apron 2 1/2,casing,2 1/2,11/16,Poplar,,10.00`, // same name, other kind: a new item
    ]);
    expect(summary(p)).toEqual([
      [2, "update", "a", ["name", "supplierCode"]],
      [3, "update", "b", ["name", "stock"]],
      [4, "create", null, ["name", "kind", "faceWidth", "thickness", "species", "stock"]],
    ]);
    expect(p.rows[1]!.diff.stock).toEqual({ before: [{ length: 96, price: 10 }], after: [{ length: 96, price: 12.5 }] });
    expect(p.deletions).toEqual([]);
  });

  it("merge keeps what the file leaves out; replace lists it for deletion", () => {
    const rows = [`Casing 2 1/2,casing,2 1/2,11/16,Poplar,C-25,10.00`];
    expect(plan(rows, "merge").counts).toEqual({ create: 0, update: 0, unchanged: 1, error: 0, delete: 0 });
    const replace = plan(rows, "replace");
    expect(replace.deletions.map((d) => d.id)).toEqual(["b", "c"]);
    expect(replace.counts.delete).toBe(2);
  });

  it.each([
    ["the same supplier code twice in the file", [`X,casing,2,1,,Z-1,1`, `Y,casing,2,1,,z-1,1`], 3, { supplier_code: "Supplier code z-1 is also on line 2." }],
    ["the same name and kind twice in the file", [`X,casing,2,1,,,1`, `x,casing,2,1,,,2`], 3, { name: "Line 2 has the same name and kind (casing)." }],
    [
      "a row renamed onto a kept item's name",
      [`Apron 2 1/2,apron,2,1,,C-25,1`],
      2,
      { name: expect.stringMatching(/already has apron named "Apron 2 1\/2"/) },
    ],
  ])("refuses %s, on the later line", (_, rows, line, errors) => {
    const p = plan(rows);
    const bad = p.rows.filter((r) => r.action === "error");
    expect(p.ok).toBe(false);
    expect(bad.map((r) => [r.line, r.errors])).toEqual([[line, errors]]);
  });

  it("gives an item without a code the code a row brings, matching it by name", () => {
    const p = plan([`Stool 5 1/4,stool,5 1/4,3/4,Poplar,NEW-1,10.00`]);
    expect(summary(p)).toEqual([[2, "update", "b", ["supplierCode"]]]);
  });

  it("counts bad rows and still plans the good ones, so the preview shows both", () => {
    const p = plan([`Casing 2 1/2,casing,2 1/2,11/16,Poplar,C-25,11.00`, `Bad,crown,2,1,,,1`, `New,other,1,1/2,,,3`]);
    expect(p.ok).toBe(false);
    expect(p.counts).toEqual({ create: 1, update: 1, unchanged: 0, error: 1, delete: 0 });
  });

  it("passes file errors through and is not ok", () => {
    const p = planImport(book, readItemsCsv("name,kind\n"), "replace");
    expect(p.ok).toBe(false);
    expect(p.fileErrors[0]?.line).toBe(1);
    expect(p.deletions).toHaveLength(3);
  });
});
