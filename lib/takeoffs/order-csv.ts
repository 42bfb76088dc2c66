import { formatLength } from "@/takeoff";
import { writeCsv } from "@/lib/csv/write";
import type { TakeoffResult } from "@/takeoff";

const money = (x: number) => x.toFixed(2);

/**
 * The material order for purchasing: one row per item, rip width and stock length, with the boards the
 * optimiser planned and the boards to buy (the waste allowance added), at the snapshot's prices.
 */
export function orderCsv(result: TakeoffResult): string {
  const header = ["material", "item", "supplier_code", "rip_width", "stock_length", "boards_planned", "boards_to_buy", "unit_price", "extended"];
  const rows: string[][] = [header];
  for (const o of result.orders) {
    for (const buy of o.toBuy) {
      // A ripped order's plan counts strips; its boards per length are in rip.
      const planned = o.rip
        ? (o.rip.boards.find((b) => b.stockLength === buy.stockLength)?.boards ?? 0)
        : o.plan.boards.filter((b) => b.stockLength === buy.stockLength).reduce((t, b) => t + b.count, 0);
      rows.push([
        o.material,
        o.itemName,
        o.supplierCode ?? "",
        o.width === undefined ? "" : formatLength(o.width),
        formatLength(buy.stockLength, { style: "feet-inches" }),
        String(planned),
        String(buy.count),
        money(buy.price),
        money(buy.count * buy.price),
      ]);
    }
  }
  return writeCsv(rows);
}
