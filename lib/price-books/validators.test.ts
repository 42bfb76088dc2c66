import { describe, expect, it } from "vitest";
import { materialKindEnum } from "@/db/tables/price-books";
import { fieldErrorsOf } from "@/lib/plans/window-list/field-errors";
import { labourSchema, priceBookCreateSchema, priceBookItemCreateSchema, priceBookItemUpdateSchema, priceBookUpdateSchema } from "@/lib/validators/price-books";
import { labourRatesSchema } from "@/takeoff";
import { MATERIAL_KINDS, readKind } from "./kinds";

const errorsOf = (r: { success: boolean; error?: unknown }) => (r.success ? {} : fieldErrorsOf(r.error as never));

describe("price-book schemas", () => {
  it("know the same kinds as the database enum", () => {
    expect([...MATERIAL_KINDS]).toEqual(materialKindEnum.enumValues);
  });

  it.each([
    ["extension stock", "extension"],
    [" Casing ", "casing"],
    ["crown", null],
  ])("read the kind %j", (text, kind) => {
    expect(readKind(text)).toBe(kind);
  });

  it("turn typed labour rates into the numbers the engine prices with", () => {
    const labour = labourSchema.parse({ minutesPerOpening: { "stool-and-apron": "45", "picture-frame": 30 }, minutesPerExtensionFoot: "2.5", hourlyRate: "$58.00" });
    expect(labour).toEqual({ minutesPerOpening: { "stool-and-apron": 45, "picture-frame": 30 }, minutesPerExtensionFoot: 2.5, hourlyRate: 58 });
    expect(labourRatesSchema.parse(labour)).toEqual(labour);
  });

  it("read lengths as written and keep stock shortest first", () => {
    const item = priceBookItemCreateSchema.parse({
      name: " Casing ",
      kind: "casing",
      faceWidth: `2 1/2"`,
      thickness: "11/16",
      species: "",
      stock: [
        { length: "10'", price: "17.50" },
        { length: "2438.4 mm", price: 14.2 },
      ],
    });
    expect(item).toEqual({ name: "Casing", kind: "casing", faceWidth: 2.5, thickness: 0.6875, species: null, stock: [{ length: 96, price: 14.2 }, { length: 120, price: 17.5 }] });
  });

  it.each([
    ["a book update with only a version", priceBookUpdateSchema, { version: 1 }, { _: "Nothing to change." }],
    ["an item update without a version", priceBookItemUpdateSchema, { name: "A" }, { version: "Version is required: reload and try again." }],
    ["a tax rate over 100 %", priceBookCreateSchema, { name: "A", taxRate: 1.5 }, { taxRate: "Tax rate must be at most 100 %." }],
    ["a negative markup", priceBookCreateSchema, { name: "A", markup: -0.1 }, { markup: "Markup must be zero or more." }],
    ["a field the API does not know", priceBookCreateSchema, { name: "A", colour: "red" }, { _: expect.stringMatching(/colour/) }],
    ["a face width over two feet", priceBookItemUpdateSchema, { version: 1, faceWidth: "30" }, { faceWidth: `Face width is over 24" — wider than any trim board.` }],
    ["an empty stock list", priceBookItemUpdateSchema, { version: 1, stock: [] }, { stock: "Give at least one stock length and its price." }],
  ])("refuse %s", (_, schema, input, errors) => {
    expect(errorsOf(schema.safeParse(input))).toEqual(errors);
  });
});
