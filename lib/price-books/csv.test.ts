import { describe, expect, it } from "vitest";
import { itemsToCsv, readItemsCsv } from "./csv";
import type { ItemFields } from "./types";

const casing: ItemFields = {
  name: "Casing, colonial 2 1/2",
  kind: "casing",
  faceWidth: 2.5,
  thickness: 0.6875,
  species: "Primed finger-joint pine",
  supplierCode: "C-250",
  stock: [
    { length: 84, price: 9.1 },
    { length: 96, price: 10.45 },
  ],
};
const stool: ItemFields = {
  name: '=Stool "bullnose"',
  kind: "stool",
  faceWidth: 5.25,
  thickness: 0.75,
  species: null,
  supplierCode: null,
  stock: [{ length: 102, price: 31 }],
};
const metric: ItemFields = { ...casing, name: "Metric casing", supplierCode: "M-1", faceWidth: 70 / 25.4, stock: [{ length: 2440 / 25.4, price: 12 }] };

const HEADER = "name,kind,face_width,thickness,species,supplier_code";
const one = (text: string) => readItemsCsv(`${HEADER},price 8'\n${text}\n`);

describe("exporting items", () => {
  it("writes one price column per stock length, lengths as a tape reads them, prices in cents", () => {
    const csv = itemsToCsv([stool, casing]);
    expect(csv.startsWith("\uFEFF")).toBe(true);
    expect(csv.slice(1).split("\r\n")).toEqual([
      `${HEADER},price 7',price 8',"price 8'-6"""`,
      `"Casing, colonial 2 1/2",casing,"2 1/2""","11/16""",Primed finger-joint pine,C-250,9.10,10.45,`,
      // A name a spreadsheet would run as a formula is written behind an apostrophe.
      `"'=Stool ""bullnose""",stool,"5 1/4""","3/4""",,,,,31.00`,
      "",
    ]);
  });

  it.each([
    ["1/16 lengths and sorted stock", [casing, stool]],
    ["lengths off the 1/16 (typed in millimetres)", [metric]],
  ])("reads back exactly what it wrote: %s", (_, items) => {
    const read = readItemsCsv(itemsToCsv(items));
    expect(read.fileErrors).toEqual([]);
    expect(read.rows.map((r) => r.errors)).toEqual(items.map(() => ({})));
    const back = read.rows.map((r) => r.item!);
    for (const item of items) expect(back).toContainEqual(item);
  });
});

describe("importing items", () => {
  it("takes kinds by name or label, $ prices and blank cells as 'not sold in that length'", () => {
    const read = readItemsCsv(`${HEADER},price 8',price 10'\nExt board,Extension stock,3 1/2,3/4,Poplar,,$21.00,\n`);
    expect(read.rows[0]).toMatchObject({ line: 2, errors: {}, item: { kind: "extension", stock: [{ length: 96, price: 21 }], supplierCode: null } });
  });

  it.each([
    ["an unknown kind", `A,crown,2 1/2,3/4,,,10`, { kind: "Kind must be casing, stool, apron, extension or other." }],
    ["an unreadable length", `A,casing,wide,3/4,,,10`, { face_width: expect.stringMatching(/^Face width: write a length/) }],
    ["a price with a tenth of a cent", `A,casing,2 1/2,3/4,,,10.005`, { "price 8'": "Price must be in dollars and cents (at most 2 decimals)." }],
    ["a negative price", `A,casing,2 1/2,3/4,,,-4`, { "price 8'": "Price must be zero or more." }],
    ["no price at all", `A,casing,2 1/2,3/4,,,`, { stock: "Give a price in at least one price column." }],
    ["a missing name", `,casing,2 1/2,3/4,,,10`, { name: "Item name is required." }],
    ["too many values", `A,casing,2 1/2,3/4,,,10,oops`, { _row: expect.stringMatching(/8 values; the header has 7 columns/) }],
    ["too few values", `A,casing,2 1/2`, { _row: expect.stringMatching(/3 values/) }],
  ])("names the column of %s", (_, row, errors) => {
    const read = one(row);
    expect(read.rows[0]?.errors).toEqual(errors);
    expect(read.rows[0]?.item).toBeNull();
  });

  it("numbers rows by the file's lines, past quoted line breaks and blank lines", () => {
    const read = readItemsCsv(`${HEADER},price 8'\n"Two\nline name",casing,2,3/4,,,1\n\nB,casing,2,3/4,,,x\n`);
    expect(read.rows.map((r) => [r.line, Object.keys(r.errors)])).toEqual([
      [2, []],
      [5, ["price 8'"]],
    ]);
  });

  it.each([
    ["an empty file", "", /empty/],
    ["a header alone", `${HEADER},price 8'\n`, /no items/],
    ["a missing column", `name,kind,face_width,thickness,price 8'\nA,casing,2,1,3\n`, /Missing columns: species, supplier_code/],
    ["an unknown column", `${HEADER},notes,price 8'\n`, /Unknown column "notes"/],
    ["a price column that is not a length", `${HEADER},price eight\n`, /write the stock length in feet/],
    ["a price column under a foot (8 meaning 8 inches)", `${HEADER},price 8\n`, /write the stock length in feet/],
    ["the same length twice", `${HEADER},price 8',price 96\n`, /Two columns price the 8' length/],
    ["semicolons", "name;kind;face_width\n", /semicolons/],
    ["an unclosed quote", `${HEADER},price 8'\n"A,casing\n`, /never closed/],
  ])("refuses %s as a whole, on line 1 or where it happened", (_, text, message) => {
    const read = readItemsCsv(text);
    expect(read.rows).toEqual([]);
    expect(read.fileErrors[0]?.message).toMatch(message);
  });
});
