import { costBreakdown, layoutBar, type SegmentKey } from "@/lib/takeoffs/cost-breakdown";
import { ratioPercent, usd } from "@/lib/takeoffs/format";
import type { TakeoffResult } from "@/takeoff";

const WIDTH = 960;
const BAR = 40;
const FONT = 13;
const ROW = 20;

// Materials in wood tones, the rest in shop colours; every segment is also named under the bar.
const FILL: Record<SegmentKey, string> = {
  casing: "fill-spruce-800",
  mullion: "fill-spruce-700",
  stool: "fill-maple-300",
  apron: "fill-spruce-100",
  extension: "fill-spruce-600",
  labour: "fill-brass-400",
  markup: "fill-graphite-600",
  tax: "fill-graphite-400",
};

// Dark fills carry white text inside; light ones graphite (both pairs meet WCAG AA).
const DARK = new Set<SegmentKey>(["casing", "mullion", "extension", "markup"]);

/** One bar for the bid, split by where the money goes, with a table for screen readers. */
export function CostChart({ result }: { result: TakeoffResult }) {
  const parts = costBreakdown(result);
  const placed = layoutBar(parts, WIDTH, FONT);
  const outside = placed.filter((p) => !p.inside);
  const rowsOf = (side: "above" | "below") => Math.max(0, ...outside.filter((p) => p.side === side).map((p) => p.row + 1));
  const above = rowsOf("above");
  const barTop = above > 0 ? above * ROW + 8 : 0;
  const height = barTop + BAR + (rowsOf("below") > 0 ? rowsOf("below") * ROW + 8 : 0) + 2;
  return (
    <figure className="space-y-2">
      <figcaption className="text-sm font-semibold text-graphite-900">Where the bid goes</figcaption>
      <div className="overflow-x-auto">
        <svg viewBox={`0 0 ${WIDTH} ${height}`} className="h-auto w-full min-w-[40rem]" aria-hidden>
          {placed.map((p) => (
            <rect key={p.key} x={p.x} y={barTop} width={p.width} height={BAR} className={`${FILL[p.key]} stroke-white`} strokeWidth={1.5} />
          ))}
          {placed
            .filter((p) => p.inside)
            .map((p) => (
              <text key={`in-${p.key}`} x={p.x + p.width / 2} y={barTop + BAR / 2 - 3} textAnchor="middle" fontSize={FONT} className={DARK.has(p.key) ? "fill-white" : "fill-graphite-900"}>
                <tspan fontWeight={600}>{p.label}</tspan>
                <tspan x={p.x + p.width / 2} dy={FONT + 2}>
                  {p.amountText}
                </tspan>
              </text>
            ))}
          {outside.map((p) => {
            const mid = p.x + p.width / 2;
            const below = p.side === "below";
            const y = below ? barTop + BAR + 8 + (p.row + 1) * ROW - 5 : barTop - 8 - p.row * ROW - 5;
            const leaderEnd = below ? y - FONT + 1 : y + 4;
            return (
              <g key={`out-${p.key}`}>
                <path d={`M${mid} ${below ? barTop + BAR : barTop}V${leaderEnd}`} className="stroke-graphite-700" strokeWidth={1} />
                <text x={p.labelX} y={y} fontSize={FONT} className="fill-graphite-900">
                  <tspan fontWeight={600}>{p.label}</tspan> {p.amountText}
                </text>
              </g>
            );
          })}
        </svg>
      </div>
      {/* A table ignores the clipping sr-only relies on; its wrapper does not. */}
      <div className="sr-only">
        <table>
          <caption>Where the bid goes</caption>
          <thead>
            <tr>
              <th scope="col">Part</th>
              <th scope="col">Amount</th>
              <th scope="col">Share of bid</th>
            </tr>
          </thead>
          <tbody>
            {parts.map((p) => (
              <tr key={p.key}>
                <th scope="row">{p.label}</th>
                <td>{usd(p.amount)}</td>
                <td>{ratioPercent(p.share)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </figure>
  );
}
