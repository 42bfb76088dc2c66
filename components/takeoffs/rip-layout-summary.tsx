import { count } from "@/lib/takeoffs/format";
import { layoutText, patternText, ripLayoutsOf, stripCutGroups, stripGroupTitle } from "@/lib/takeoffs/rip-layouts";
import type { BoardOrder } from "@/takeoff";

/**
 * A ripped order with several strip widths, on screen: which strips come from which boards, then (folded
 * away) the crosscuts made along each strip width. Nothing for orders without layouts.
 */
export function RipLayoutSummary({ order }: { order: BoardOrder }) {
  const layouts = ripLayoutsOf(order);
  if (layouts.length === 0) return null;
  const groups = stripCutGroups(order);
  return (
    <div className="space-y-1 text-xs text-graphite-700">
      <p className="font-semibold text-graphite-900">How the boards of the cutting plan are ripped (allowance boards are spares):</p>
      <ul className="list-disc space-y-0.5 pl-5">
        {layouts.map((l, i) => (
          <li key={i}>{layoutText(l)}</li>
        ))}
      </ul>
      <details>
        <summary className="cursor-pointer font-medium text-spruce-700">Crosscuts along each strip width</summary>
        <div className="mt-1 space-y-1">
          {groups.map((g) => (
            <div key={`${g.width}|${g.stockLength}`}>
              <p className="font-medium text-graphite-900">
                {stripGroupTitle(g)} ({count(g.strips)} {g.strips === 1 ? "strip" : "strips"})
              </p>
              <ul className="list-disc pl-5">
                {g.patterns.map((p, i) => (
                  <li key={i}>{patternText(p)}</li>
                ))}
                {g.spare > 0 && <li>{count(g.spare)} spare {g.spare === 1 ? "strip" : "strips"}, not cut (offcut)</li>}
              </ul>
            </div>
          ))}
        </div>
      </details>
    </div>
  );
}
