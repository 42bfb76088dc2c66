import { count, tapeLength } from "@/lib/takeoffs/format";
import { MATERIAL_LABELS } from "@/lib/takeoffs/labels";
import { cutsText, layoutText, ripLayoutsOf, ripWidthsText, stripCutGroups, stripGroupTitle } from "@/lib/takeoffs/rip-layouts";
import type { BoardOrder } from "@/takeoff";

/**
 * The usual cautions for ripping on a table saw (common practice; the saw's manual governs), shown
 * wherever the crew is told to rip.
 */
export function TableSawCautions() {
  return (
    <aside className="rounded-md border-2 border-brass-500 bg-maple-100 p-3 text-sm" aria-label="Table saw safety">
      <p className="font-semibold">⚠ Ripping on the table saw</p>
      <ul className="mt-1 list-disc space-y-0.5 pl-5">
        <li>Keep the riving knife or splitter and the blade guard fitted; they keep the kerf from closing on the blade.</li>
        <li>Rip against the fence, never freehand; keep the offcut side of the blade clear, and stand out of line with the blade.</li>
        <li>Use a push stick or push block for the last of every rip and for every narrow strip; never reach over the blade.</li>
        <li>Wear eye and hearing protection; disconnect power before changing the blade or clearing a jam.</li>
      </ul>
      <p className="mt-2 text-xs text-graphite-700">
        Follow the saw manufacturer&apos;s manual for setup and guarding. Local building codes and licensed practice govern the work; this list does not certify
        compliance.
      </p>
    </aside>
  );
}

/** One ripped order: its board layouts, then along each strip width the crosscuts, longest first. */
function OrderPlan({ order }: { order: BoardOrder }) {
  const groups = stripCutGroups(order);
  return (
    <div className="space-y-2 break-inside-avoid">
      <h3 className="font-semibold">
        {order.itemName} · {MATERIAL_LABELS[order.material]} · strips of {ripWidthsText(order)}
      </h3>
      <p className="text-sm font-medium">1. Rip the boards, setting the fence for each strip width in turn (widest first):</p>
      <ul className="list-disc pl-5 text-sm">
        {ripLayoutsOf(order).map((l, i) => (
          <li key={i}>{layoutText(l)}</li>
        ))}
      </ul>
      <p className="text-sm font-medium">2. Crosscut each strip, longest piece first:</p>
      <table className="w-full border-collapse text-sm">
        <thead className="border-b border-graphite-400 text-left">
          <tr>
            <th className="py-1 pr-2 font-medium">Strip</th>
            <th className="num py-1 pr-2 font-medium">Strips</th>
            <th className="py-1 pr-2 font-medium">Cuts, in order</th>
            <th className="num py-1 font-medium">Offcut each</th>
          </tr>
        </thead>
        <tbody>
          {groups.flatMap((g) => [
            ...g.patterns.map((p, i) => (
              <tr key={`${g.width}|${g.stockLength}|${i}`} className="border-b border-maple-200">
                <td className="py-1 pr-2">{stripGroupTitle(g)}</td>
                <td className="num py-1 pr-2">{count(p.count)}</td>
                <td className="py-1 pr-2 font-semibold">{cutsText(p.cuts)}</td>
                <td className="num py-1">{tapeLength(Math.max(0, p.offcut))}</td>
              </tr>
            )),
            ...(g.spare > 0
              ? [
                  <tr key={`${g.width}|${g.stockLength}|spare`} className="border-b border-maple-200 text-graphite-700">
                    <td className="py-1 pr-2">{stripGroupTitle(g)}</td>
                    <td className="num py-1 pr-2">{count(g.spare)}</td>
                    <td className="py-1 pr-2">spare, not cut</td>
                    <td className="num py-1">whole strip</td>
                  </tr>,
                ]
              : []),
          ])}
        </tbody>
      </table>
    </div>
  );
}

/**
 * "Ripping and cutting plan" on the crew's cut list: for every order whose boards are ripped to several
 * strip widths, how to rip the planned boards and what to cut along each strip. Cutting the longest pieces
 * first leaves the most stock for the short ones if a defect turns up (common practice). Nothing for
 * takeoffs without such orders, whose cut list stays as it was.
 */
export function RippingPlan({ orders }: { orders: readonly BoardOrder[] }) {
  const ripped = orders.filter((o) => ripLayoutsOf(o).length > 0);
  if (ripped.length === 0) return null;
  return (
    <section aria-labelledby="ripping-plan" className="space-y-3">
      <h2 id="ripping-plan" className="text-xl font-bold">
        Ripping and cutting plan
      </h2>
      <p className="text-sm text-graphite-700">
        For the boards of the cutting plan; the waste-allowance boards are spares. Lengths are to the long point of miters; check them against the openings on site.
      </p>
      <TableSawCautions />
      {ripped.map((o) => (
        <OrderPlan key={`${o.itemId}|${o.material}|${o.widths?.join("+") ?? o.width ?? ""}`} order={o} />
      ))}
    </section>
  );
}
