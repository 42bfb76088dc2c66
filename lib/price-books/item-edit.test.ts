import { describe, expect, it } from "vitest";
import { editText, planItemEdit, priceColumnId, type ItemColumn } from "./item-edit";
import type { PriceBookItemView } from "./types";

const row: PriceBookItemView = {
  id: "i1",
  version: 3,
  name: "Casing 2 1/2",
  kind: "casing",
  faceWidth: 2.5,
  thickness: 0.6875,
  species: "Poplar",
  supplierCode: null,
  stock: [
    { length: 84, price: 9 },
    { length: 96, price: 10.15 },
  ],
};
const p96 = priceColumnId(96);
const p120 = priceColumnId(120);

describe("editing a cell of the items table", () => {
  it.each([
    ["thickness", `11/16"`],
    [p96, "10.15"],
    [p120, ""],
    ["kind", "casing"],
  ] as [ItemColumn, string][])("starts %s from %j", (column, text) => {
    expect(editText(row, column)).toBe(text);
  });

  it.each([
    ["an untouched price", p96, "10.15", { kind: "unchanged" }],
    ["the same length written another way", "faceWidth", `2-1/2"`, { kind: "unchanged" }],
    ["a new price", p96, "10.60", { kind: "patch", body: { version: 3, stock: [{ length: 84, price: 9 }, { length: 96, price: "10.60" }] } }],
    ["a price in a new length", p120, "12", { kind: "patch", body: { version: 3, stock: [{ length: 84, price: 9 }, { length: 96, price: 10.15 }, { length: 120, price: "12" }] } }],
    ["an emptied price", p96, " ", { kind: "patch", body: { version: 3, stock: [{ length: 84, price: 9 }] } }],
    ["a cleared species", "species", "", { kind: "patch", body: { version: 3, species: "" } }],
    ["a bad price, beside its cell", p96, "ten", { kind: "invalid", fields: { [p96]: "Price: write a number such as 14.20." } }],
    ["a bad length", "thickness", "thin", { kind: "invalid", fields: { thickness: expect.stringMatching(/^Thickness: write a length/) } }],
  ] as [string, ItemColumn, string, unknown][])("%s", (_, column, text, plan) => {
    expect(planItemEdit(row, column, text)).toEqual(plan);
  });

  it("will not empty the last price: the item would have no stock", () => {
    const one = { ...row, stock: [{ length: 96, price: 10 }] };
    expect(planItemEdit(one, p96, "")).toEqual({ kind: "invalid", fields: { [p96]: "An item needs at least one price; delete the item instead." } });
  });
});
