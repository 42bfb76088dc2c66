import { describe, expect, it } from "vitest";
import { bookSummary, describeDiff, itemSummary } from "./describe";
import { bookDiff, itemDiff } from "./diff";
import type { ItemFields } from "./types";

const casing: ItemFields = {
  name: "Casing 2 1/2",
  kind: "casing",
  faceWidth: 2.5,
  thickness: 0.6875,
  species: "Poplar",
  supplierCode: null,
  stock: [
    { length: 84, price: 9 },
    { length: 96, price: 10 },
  ],
};
const labour = { minutesPerOpening: { "stool-and-apron": 45, "picture-frame": 30 }, minutesPerExtensionFoot: 2, hourlyRate: 58 };
const book = { name: "Shop", labour, markup: 0.15, taxRate: 0.0825, taxLabour: false };

describe("describing changes", () => {
  it.each([
    ["nothing", casing, []],
    ["a price within a cent of float noise", { ...casing, stock: [{ length: 84, price: 9.000000001 }, { length: 96, price: 10 }] }, []],
    ["a size", { ...casing, thickness: 0.75 }, [`thickness 11/16" → 3/4"`]],
    ["a cleared species", { ...casing, species: null }, ["species or finish Poplar → —"]],
    ["stock added, repriced and dropped", { ...casing, stock: [{ length: 96, price: 10.5 }, { length: 102, price: 11 }] }, [`8' $10.00 → $10.50`, `8'-6" added at $11.00`, `7' removed`]],
  ])("an item: %s", (_, after, lines) => {
    expect(describeDiff(itemDiff(casing, after))).toEqual(lines);
  });

  it("a new item names its size and how many lengths it comes in", () => {
    expect(itemSummary("create", null, casing, itemDiff(null, casing), "CSV import")).toBe(`Added casing "Casing 2 1/2": 2 1/2" × 11/16", 2 stock lengths (CSV import)`);
  });

  it("a book's rates read in the units people set them in", () => {
    const diff = bookDiff(book, { ...book, taxRate: 0.09, labour: { ...labour, hourlyRate: 61.5 }, taxLabour: true });
    expect(bookSummary("update", "Shop", diff)).toBe("Changed hourly rate $58.00 → $61.50; tax rate 8.25 % → 9 %; tax labour no → yes");
  });
});
