import type { CrewGroup } from "@/lib/takeoffs/crew-cut-list";
import { cutDetails } from "@/lib/takeoffs/cut-details";
import { tapeLength } from "@/lib/takeoffs/format";
import { endsText, PART_LABELS, STYLE_NAMES } from "@/lib/takeoffs/labels";
import { openingSizeText } from "@/lib/takeoffs/opening-size";
import type { Opening } from "@/takeoff";

/**
 * One opening type on the crew's printed cut list: its size in words for its kind, then each piece with
 * its length, ends and, for curved, angled or spliced pieces, the radius, saw settings and scarf joint.
 * `opening` is the saved opening when known (every kind); otherwise the window size the group carries.
 */
export function CrewCutListTable({ w, units, opening }: { w: CrewGroup["windows"][number]; units: number; opening?: Opening }) {
  const size = opening ? openingSizeText(opening) : `${tapeLength(w.size.width)} × ${tapeLength(w.size.height)}`;
  const style = opening?.kind === "door" ? "" : ` · ${STYLE_NAMES[w.style as keyof typeof STYLE_NAMES]}`;
  return (
    <div className="break-inside-avoid">
      <h3 className="font-semibold">
        {w.mark} · {size}
        {style} · {w.perUnit} per unit
        {units > 1 ? `, ${w.total} in all` : ""}
      </h3>
      <table className="mt-1 w-full border-collapse text-sm">
        <thead className="border-b border-graphite-400 text-left">
          <tr>
            <th className="py-1 pr-2 font-medium">Piece</th>
            <th className="num py-1 pr-2 font-medium">Length</th>
            <th className="num py-1 pr-2 font-medium">Width</th>
            <th className="py-1 pr-2 font-medium">Ends · cuts</th>
            <th className="num py-1 pr-2 font-medium">Per opening</th>
            <th className="num py-1 pr-2 font-medium">Per unit</th>
            {units > 1 && <th className="num py-1 font-medium">All units</th>}
          </tr>
        </thead>
        <tbody>
          {w.pieces.map((p, i) => {
            const details = cutDetails(p);
            return (
              <tr key={`${p.part}-${i}`} className="border-b border-maple-200 align-top">
                <td className="py-1 pr-2">{PART_LABELS[p.part]}</td>
                <td className="num py-1 pr-2 font-semibold">{tapeLength(p.length)}</td>
                <td className="num py-1 pr-2">{p.width === undefined ? "" : tapeLength(p.width)}</td>
                <td className="py-1 pr-2">
                  {endsText(p.ends)}
                  {details.length > 0 && <span className="block text-xs">{details.join(" · ")}</span>}
                </td>
                <td className="num py-1 pr-2">{p.quantity}</td>
                <td className="num py-1 pr-2">{p.perUnit}</td>
                {units > 1 && <td className="num py-1">{p.total}</td>}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
