import { formatLength } from "@/takeoff";
import { writeCsv } from "@/lib/csv/write";
import type { BoardOrder, TakeoffResult } from "@/takeoff";
import { layoutText, ripLayoutsOf } from "./rip-layouts";

const money = (x: number) => x.toFixed(2);

/** Every strip width of the order, widest first: one for a single-width rip, several for mixed layouts. */
const ripWidths = (o: BoardOrder) => (o.widths && o.widths.length > 0 ? o.widths : o.width === undefined ? [] : [o.width]).map((w) => formatLength(w)).join(", ");

/**
 * The material order for purchasing: one row per item, rip width and stock length, with the boards the
 * optimiser planned and the boards to buy (the waste allowance added), at the snapshot's prices. An order
 * ripped to several strip widths says in `rip_layout` how the planned boards of that length are ripped
 * (added last, so a sheet that reads the earlier columns by position still reads them); empty otherwise.
 */
export function orderCsv(result: TakeoffResult): string {
  const header = ["material", "item", "supplier_code", "rip_width", "stock_length", "boards_planned", "boards_to_buy", "unit_price", "extended", "rip_layout"];
  const rows: string[][] = [header];
  for (const o of result.orders) {
    for (const buy of o.toBuy) {
      // A ripped order's plan counts strips; its boards per length are in rip.
      const planned = o.rip
        ? (o.rip.boards.find((b) => b.stockLength === buy.stockLength)?.boards ?? 0)
        : o.plan.boards.filter((b) => b.stockLength === buy.stockLength).reduce((t, b) => t + b.count, 0);
      const layouts = ripLayoutsOf(o).filter((l) => l.stockLength === buy.stockLength);
      rows.push([
        o.material,
        o.itemName,
        o.supplierCode ?? "",
        ripWidths(o),
        formatLength(buy.stockLength, { style: "feet-inches" }),
        String(planned),
        String(buy.count),
        money(buy.price),
        money(buy.count * buy.price),
        layouts.map(layoutText).join("; "),
      ]);
    }
  }
  return writeCsv(rows);
}
