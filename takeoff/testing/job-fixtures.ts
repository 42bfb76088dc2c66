import type { PriceItemSnapshot, TakeoffInputs, TakeoffPrices } from "../job/types";

/** Invented prices for tests: enough sizes for the fixtures' windows, not proportional to length. */
export function testPrices(extra: PriceItemSnapshot[] = []): TakeoffPrices {
  const stock = (p8: number, p10: number, p12: number) => [
    { length: 96, price: p8 },
    { length: 120, price: p10 },
    { length: 144, price: p12 },
  ];
  return {
    priceBook: { id: "pb", name: "Test book" },
    items: [
      { id: "casing-25", name: "Casing 2 1/2 × 11/16 pine", kind: "casing", faceWidth: 2.5, thickness: 0.6875, species: "pine", supplierCode: "C25", stock: stock(9.6, 11.5, 13.2) },
      { id: "casing-35", name: "Casing 3 1/2 × 3/4 poplar", kind: "casing", faceWidth: 3.5, thickness: 0.75, species: "poplar", supplierCode: "C35", stock: stock(16.8, 20.5, 24.0) },
      { id: "stool-525", name: "Stool 5 1/4 poplar", kind: "stool", faceWidth: 5.25, thickness: 1, species: "poplar", supplierCode: "S525", stock: stock(28, 34, 40) },
      { id: "ext-35", name: "Extension 1x4", kind: "extension", faceWidth: 3.5, thickness: 0.75, species: "poplar", supplierCode: "E4", stock: stock(12, 14.5, 17) },
      { id: "ext-55", name: "Extension 1x6", kind: "extension", faceWidth: 5.5, thickness: 0.75, species: "poplar", supplierCode: "E6", stock: stock(18, 22, 26) },
      ...extra,
    ],
    labour: { minutesPerOpening: { "stool-and-apron": 45, "picture-frame": 30 }, minutesPerExtensionFoot: 2, hourlyRate: 60 },
    markup: 0.15,
    taxRate: 0.08,
    taxLabour: false,
  };
}

/** Two window types on one unit type (× 10) and a common area. */
export function testInputs(overrides: Partial<TakeoffInputs> = {}): TakeoffInputs {
  return {
    settings: { kerf: 0.125, wastePercent: 10 },
    casingItemId: null,
    unitTypes: [{ id: "ua", name: "Type A", count: 10 }],
    openingTypes: [
      { id: "w1", mark: "W1", width: 36, height: 60, setback: 1.4375, trimSpec: { style: "stool-and-apron", casingWidth: 2.5, casingThickness: 0.6875 } },
      { id: "w4", mark: "W4", width: 24, height: 36, setback: 0.5, trimSpec: { style: "picture-frame", casingWidth: 2.5, casingThickness: 0.6875 } },
    ],
    counts: { perUnit: { ua: { w1: 2, w4: 1 } }, commonAreas: { w1: 3 }, job: { w1: 23, w4: 10 } },
    ...overrides,
  };
}
