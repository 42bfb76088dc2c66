import { hours, usd } from "@/lib/takeoffs/format";
import type { TakeoffPrices, TakeoffResult } from "@/takeoff";

const pct = (fraction: number) => `${+(fraction * 100).toFixed(3)} %`;

/** Material, labour, markup and tax down to the bid total; each line as rounded on the bid, so the column adds up. */
export function BidSummary({ result, prices }: { result: TakeoffResult; prices: TakeoffPrices }) {
  const { bid } = result;
  const lines: [string, string, number][] = [
    ["Material", "boards to buy, waste allowance included", bid.material],
    ["Labour", `${hours(result.labourMinutes)} at ${usd(prices.labour.hourlyRate)} an hour`, bid.labour],
    ["Subtotal", "", bid.subtotal],
    ["Markup", `${pct(prices.markup)} of the subtotal`, bid.markup],
    ["Tax", `${pct(prices.taxRate)} on ${prices.taxLabour ? "material and labour" : "material"}, marked up`, bid.tax],
  ];
  return (
    <table className="w-full max-w-xl border-collapse text-sm">
      <caption className="sr-only">Bid summary</caption>
      <tbody>
        {lines.map(([label, detail, amount]) => (
          <tr key={label} className={`border-b border-maple-100 ${label === "Subtotal" ? "font-semibold" : ""}`}>
            <th scope="row" className="py-1.5 pr-3 text-left font-medium">
              {label}
              {detail && <span className="block text-xs font-normal text-graphite-600">{detail}</span>}
            </th>
            <td className="num py-1.5 align-top">{usd(amount)}</td>
          </tr>
        ))}
      </tbody>
      <tfoot>
        <tr className="border-t-2 border-spruce-700">
          <th scope="row" className="py-2 pr-3 text-left text-base font-bold">
            Bid total
          </th>
          <td className="num py-2 text-base font-bold">{usd(bid.total)}</td>
        </tr>
      </tfoot>
    </table>
  );
}
