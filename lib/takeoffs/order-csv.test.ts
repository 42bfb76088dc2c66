import { expect, it } from "vitest";
import { parseCsv } from "@/lib/price-books/csv-grammar";
import { computeTakeoff } from "@/takeoff";
import { testInputs, testPrices } from "@/takeoff/testing/job-fixtures";
import { orderCsv } from "./order-csv";

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
