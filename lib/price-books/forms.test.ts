import { describe, expect, it } from "vitest";
import { emptyItemDraft, planNewItem, planRates, ratesDraft } from "./forms";
import type { PriceBookSummary } from "./types";

const book: PriceBookSummary = {
  id: "b1",
  name: "Shop",
  labour: { minutesPerOpening: { "stool-and-apron": 45, "picture-frame": 30 }, minutesPerExtensionFoot: 2, hourlyRate: 58 },
  markup: 0.15,
  taxRate: 0.0825,
  taxLabour: false,
  version: 4,
  updatedAt: "2027-01-05T10:00:00Z",
};

describe("the rates form", () => {
  it("shows percentages and money as people write them", () => {
    expect(ratesDraft(book)).toMatchObject({ markup: "15", taxRate: "8.25", hourlyRate: "58.00", stoolAndApron: "45" });
  });

  it("sends a typed per-kind rate as minutes and shows an unset one blank", () => {
    expect(ratesDraft(book)).toMatchObject({ doorSide: "", mull: "", arch: "", bayCorner: "" });
    const plan = planRates(book, { ...ratesDraft(book), doorSide: "35", arch: "90" });
    expect(plan).toMatchObject({ kind: "send", body: { labour: { minutesPerDoorSide: "35", minutesArchPremium: "90" } } });
    expect(ratesDraft({ ...book, labour: { ...book.labour, minutesPerDoorSide: 35 } }).doorSide).toBe("35");
  });

  it.each([
    ["nothing changed", {}, { kind: "unchanged" }],
    ["a percentage typed with its sign", { taxRate: "9 %" }, { kind: "send", body: expect.objectContaining({ version: 4, taxRate: 0.09, markup: 0.15 }) }],
    ["a bad markup and a bad rate", { markup: "lots", hourlyRate: "58.555" }, { kind: "invalid", fields: { markup: "Markup: write a number such as 45.", hourlyRate: "Hourly rate must be in dollars and cents (at most 2 decimals)." } }],
    ["an empty name", { name: " " }, { kind: "invalid", fields: { name: "Price book name is required." } }],
    // Per-kind rates: typed ones are sent, blank ones left out (not set), bad ones refused on their own field.
    ["a door-side rate typed, the others blank", { doorSide: "35" }, { kind: "send", body: expect.objectContaining({ labour: expect.not.objectContaining({ minutesPerMull: expect.anything() }) }) }],
    ["a negative mull rate", { mull: "-2" }, { kind: "invalid", fields: { mull: "Minutes per mull must be zero or more." } }],
  ])("%s", (_, change, plan) => {
    expect(planRates(book, { ...ratesDraft(book), ...change })).toEqual(plan);
  });
});

describe("the new-item form", () => {
  it("leaves blank stock rows out and keeps messages on the row they were typed in", () => {
    const draft = { ...emptyItemDraft(), name: "Apron", kind: "apron" as const, faceWidth: "2 1/2", thickness: "11/16" };
    draft.stock = [
      { length: "8'", price: "9.60" },
      { length: "", price: "" },
      { length: "8", price: "3" },
    ];
    expect(planNewItem(draft)).toEqual({ kind: "invalid", fields: { "stock.2.length": expect.stringMatching(/under a foot/) } });
    draft.stock[2] = { length: "10'", price: "12" };
    expect(planNewItem(draft)).toMatchObject({ kind: "send", body: { stock: [{ length: "8'", price: "9.60" }, { length: "10'", price: "12" }] } });
  });
});
