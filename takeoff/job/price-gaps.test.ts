import { describe, expect, it } from "vitest";
import { testPrices } from "../testing/job-fixtures";
import { placeholdersFor, type PriceGap } from "./price-gaps";

describe("placeholder prices", () => {
  // Derived: 9.03 / 96 × 144 is exactly 13.545, which rounds half up to 13.55; worked in binary floating
  // point it comes to 13.544999…, and Math.round(x * 100) / 100 priced the stand-in board at 13.54.
  it("a too-long piece's stand-in is priced at its own item's rate per inch, exactly, rounded once to the cent", () => {
    const prices = testPrices();
    prices.items = prices.items.map((i) => (i.id === "casing-25" ? { ...i, stock: [{ length: 96, price: 9.03 }] } : i));
    const gap: PriceGap = {
      material: "casing", width: 2.5, thickness: 0.6875, message: "W1's casing leg is too long.", openingTypeId: "w1", mark: "W1",
      kind: "too-long", longestPiece: 135, itemId: "casing-25", fix: "",
    };
    const [placeholder] = [...placeholdersFor([gap], prices, 0.125).values()];
    expect(placeholder!.item.stock).toEqual([{ length: 144, price: 13.55 }]);
    expect(placeholder!.basis).toBe("at the rate per foot of “Casing 2 1/2 × 11/16 pine”");
  });
});
