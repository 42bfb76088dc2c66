import { expect, it } from "vitest";
import { parseCsv } from "@/lib/price-books/csv-grammar";
import { computeTakeoff } from "@/takeoff";
import { testInputs, testPrices } from "@/takeoff/testing/job-fixtures";
import { orderCsv } from "./order-csv";
import { crosscutOrder, rippedOrder } from "./testing/board-orders";

it("writes item names and supplier codes a spreadsheet would run as formulas behind an apostrophe", async () => {
  const prices = testPrices();
  prices.items = prices.items.map((item) =>
    item.id === "casing-25" ? { ...item, name: '=HYPERLINK("http://attacker.test","Casing")', supplierCode: "@SUM(1+1)" } : item,
  );
  const parsed = parseCsv(orderCsv(await computeTakeoff(testInputs(), prices)));
  if (!parsed.ok) throw new Error(parsed.message);
  const rows = parsed.records.slice(1).map((r) => r.fields);
  const casing = rows.find((r) => r[1]?.includes("HYPERLINK"));
  expect(casing?.[1]).toBe(`'=HYPERLINK("http://attacker.test","Casing")`);
  expect(casing?.[2]).toBe("'@SUM(1+1)");
  // No cell of the file starts a formula.
  for (const cell of rows.flat()) expect(cell, cell).not.toMatch(/^[=+\-@\t\r]/);
});

it("gives a ripped order's planned boards, not its strips", async () => {
  const result = await computeTakeoff(testInputs(), testPrices());
  const parsed = parseCsv(orderCsv(result));
  if (!parsed.ok) throw new Error(parsed.message);
  const rows = parsed.records.slice(1).map((r) => r.fields);
  const ripped = result.orders.filter((o) => o.rip);
  expect(ripped.length).toBeGreaterThan(0);
  for (const o of ripped) {
    for (const b of o.rip!.boards) {
      const row = rows.find((r) => r[0] === o.material && r[1] === o.itemName && r[4] && Number(r[5]) === b.boards);
      expect(row, `${o.itemName} ${b.stockLength}`).toBeDefined();
      // Boards per length are the boards the layouts rip (strips of several widths may share one).
      expect(b.boards).toBe(o.rip!.layouts!.filter((l) => l.stockLength === b.stockLength).reduce((t, l) => t + l.count, 0));
    }
  }
});

const records = (csv: string) => {
  const parsed = parseCsv(csv);
  if (!parsed.ok) throw new Error(parsed.message);
  return parsed.records.map((r) => r.fields);
};

it("says how the boards of an order ripped to several widths are laid out, per stock length", async () => {
  // A real result with hand-made orders in place of the engine's: the CSV reads only the orders.
  const result = await computeTakeoff(testInputs(), testPrices());
  const [header, ...rows] = records(orderCsv({ ...result, orders: [rippedOrder(), crosscutOrder()] }));
  expect(header?.slice(-2)).toEqual(["extended", "rip_layout"]);
  expect(rows).toEqual([
    ["extension", "Extension 1x6 poplar", "E6", `1 1/2", 3/4"`, `16'-0"`, "12", "14", "26.00", "364.00", `12 × 16' boards, each ripped to 1 1/2" + 3/4" + 3/4" (2 1/8" left)`],
    ["extension", "Extension 1x6 poplar", "E6", `1 1/2", 3/4"`, `12'-0"`, "1", "2", "20.00", "40.00", `1 × 12' board, ripped to 1 1/2" + 1 1/2" + 3/4" (1 3/8" left)`],
    ["casing", "Casing 2 1/2 × 11/16 pine", "C25", "", `12'-0"`, "20", "22", "13.20", "290.40", ""],
  ]);
});

it("leaves rip_layout empty for single-width ripped orders saved before layouts", async () => {
  const result = await computeTakeoff(testInputs(), testPrices());
  const rows = records(orderCsv({ ...result, orders: result.orders.map((o) => (o.rip ? { ...o, rip: { ...o.rip, layouts: undefined } } : o)) })).slice(1);
  const ripped = rows.filter((r) => r[0] === "extension");
  expect(ripped.length).toBeGreaterThan(0);
  for (const r of ripped) {
    expect(r[3]).toMatch(/^\d/);
    expect(r[9]).toBe("");
  }
});
