import { Fragment } from "react";
import { count, feet, inchesText, stockLength, usd } from "@/lib/takeoffs/format";
import { MATERIAL_LABELS } from "@/lib/takeoffs/labels";
import { planProofText } from "@/lib/takeoffs/plan-proof";
import { ripLayoutsOf, ripWidthsText } from "@/lib/takeoffs/rip-layouts";
import { materialCost, type BoardOrder, type PriceItemSnapshot } from "@/takeoff";
import { PlanProofLine, PlanProofNotice } from "./plan-proof";
import { RipLayoutSummary } from "./rip-layout-summary";

const TH = "px-2 py-1.5 font-semibold";
const TD = "num whitespace-nowrap px-2 py-1";

/** Boards the plan uses at a length; a ripped order's plan counts strips, its boards are in rip. */
const planned = (o: BoardOrder, length: number) =>
  o.rip
    ? (o.rip.boards.find((b) => b.stockLength === length)?.boards ?? 0)
    : o.plan.boards.filter((b) => b.stockLength === length).reduce((t, b) => t + b.count, 0);

/** " ripped to 1 1/2", 3/4" from 5 1/2" board": how an order's boards are used; "" for boards used whole. */
function ripNote(o: BoardOrder): string {
  const widths = ripWidthsText(o);
  if (widths === null) return "";
  const from = o.stockWidth ? ` from ${inchesText(o.stockWidth)} board` : "";
  // With layouts the strips per board differ from layout to layout; they are listed under the order instead.
  const per = o.rip && ripLayoutsOf(o).length === 0 ? `, ${o.rip.stripsPerBoard} strips per board` : "";
  return ` ripped to ${widths}${from}${per}`;
}

/** One order: a row per stock length, then (best-found or ripped to layouts) a full-width row saying so. */
function OrderRows({ o, items }: { o: BoardOrder; items?: readonly PriceItemSnapshot[] }) {
  const proof = planProofText(o, items);
  const notes = proof?.proof === "best-found" || ripLayoutsOf(o).length > 0;
  return (
    <>
      {o.toBuy.map((b, i) => (
        <tr key={b.stockLength} className={i === 0 ? "border-t border-maple-200 align-top" : "align-top"}>
          {i === 0 && (
            <th scope="rowgroup" rowSpan={o.toBuy.length} className="px-2 py-1 text-left font-medium">
              {o.itemName}
              <span className="block text-xs font-normal text-graphite-600">
                {MATERIAL_LABELS[o.material]}
                {ripNote(o)} · {count(o.pieces)} pieces, {feet(o.linearInches / 12)} ft
              </span>
              {proof?.proof === "optimal" && <PlanProofLine text={proof} />}
            </th>
          )}
          {i === 0 && (
            <td rowSpan={o.toBuy.length} className="px-2 py-1 text-graphite-700">
              {o.supplierCode ?? "—"}
            </td>
          )}
          <td className={TD}>{stockLength(b.stockLength)}</td>
          <td className={TD}>{count(planned(o, b.stockLength))}</td>
          <td className={`${TD} font-semibold`}>{count(b.count)}</td>
          <td className={TD}>{usd(b.price)}</td>
          <td className={TD}>{usd(b.count * b.price)}</td>
        </tr>
      ))}
      {notes && (
        <tr>
          <td colSpan={7} className="space-y-1 px-2 pb-2 pt-0">
            {proof?.proof === "best-found" && <PlanProofLine text={proof} />}
            <RipLayoutSummary order={o} />
          </td>
        </tr>
      )}
    </>
  );
}

/**
 * What to buy: per price-book item (and rip widths), boards per stock length with the allowance, at the
 * snapshot's prices; under each order whether its plan is proven cheapest, and how ripped boards are laid out.
 * `items` (the price snapshot) lets a best-found order state its proven board bound; `settingsHref` and
 * `planSeconds` let the note above the table point to the time limit the run had.
 */
export function BoardOrderTable({
  orders,
  items,
  settingsHref,
  planSeconds,
}: {
  orders: BoardOrder[];
  items?: readonly PriceItemSnapshot[];
  settingsHref?: string;
  planSeconds?: number;
}) {
  const total = materialCost(orders);
  const boards = orders.reduce((t, o) => t + o.toBuy.reduce((s, b) => s + b.count, 0), 0);
  return (
    <div className="space-y-2">
      <PlanProofNotice orders={orders} settingsHref={settingsHref} planSeconds={planSeconds} />
      <div className="relative overflow-x-auto rounded-lg border border-maple-200 bg-white">
        <table className="w-full border-collapse text-sm">
          <caption className="sr-only">Board order: boards to buy per item and stock length</caption>
          <thead className="bg-maple-100 text-left text-graphite-700">
            <tr>
              <th scope="col" className={TH}>Item</th>
              <th scope="col" className={TH}>Supplier code</th>
              <th scope="col" className={`${TH} text-right`}>Stock length</th>
              <th scope="col" className={`${TH} text-right`} title="Boards the cutting plan uses, before the waste allowance">In cutting plan</th>
              <th scope="col" className={`${TH} text-right`} title="Cutting plan plus the waste allowance">To buy</th>
              <th scope="col" className={`${TH} text-right`}>Each</th>
              <th scope="col" className={`${TH} text-right`}>Amount</th>
            </tr>
          </thead>
          <tbody>
            {orders.map((o) => (
              <Fragment key={`${o.itemId}|${o.material}|${o.width ?? o.widths?.join("+") ?? ""}`}>
                <OrderRows o={o} items={items} />
              </Fragment>
            ))}
          </tbody>
          <tfoot>
            <tr className="border-t-2 border-maple-300 bg-maple-50">
              <th scope="row" colSpan={4} className="px-2 py-1.5 text-left font-semibold">
                Boards to buy, waste allowance included
              </th>
              <td className={`${TD} font-semibold`}>{count(boards)}</td>
              <td />
              <td className={`${TD} font-semibold`}>{usd(total)}</td>
            </tr>
          </tfoot>
        </table>
      </div>
    </div>
  );
}
