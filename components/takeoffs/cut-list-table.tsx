import { count, inchesText, tapeLength } from "@/lib/takeoffs/format";
import { PART_LABELS } from "@/lib/takeoffs/labels";
import type { OpeningTypeResult } from "@/takeoff";
import { CutDetails } from "./cut-details-cell";
import { EndsCell } from "./end-glyph";

const TH = "px-1.5 py-1.5 font-semibold";

/**
 * The pieces one opening type needs, as the crew cuts them: lengths to 1/16 in, miters to the long point,
 * and under the ends what a curved, angled or spliced piece also needs (radius, saw settings, scarf).
 */
export function CutListTable({ ot, itemName }: { ot: OpeningTypeResult; itemName: (id: string | undefined) => string }) {
  return (
    <div className="relative overflow-x-auto rounded-md border border-maple-200">
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">Cut list for {ot.mark}</caption>
        <thead className="bg-maple-100 text-left text-graphite-700">
          <tr>
            <th scope="col" className={TH}>
              Part <span className="font-normal">· cut from</span>
            </th>
            <th scope="col" className={`${TH} text-right`}>Per opening</th>
            <th scope="col" className={`${TH} text-right`}>In job</th>
            <th scope="col" className={`${TH} text-right`}>Length</th>
            <th scope="col" className={`${TH} text-right`}>Width</th>
            <th scope="col" className={TH}>
              Ends <span className="font-normal">· cuts</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {ot.cutList.map((p, i) => (
            <tr key={`${p.part}-${i}`} className="border-t border-maple-100 align-top">
              <th scope="row" className="px-1.5 py-1 text-left font-medium">
                <span className="whitespace-nowrap">{PART_LABELS[p.part]}</span>
                <span className="block text-xs font-normal text-graphite-600">
                  <span className="sr-only">cut from </span>
                  {itemName(ot.items[p.material])}
                </span>
              </th>
              <td className="num px-1.5 py-1">{count(p.quantity)}</td>
              <td className="num px-1.5 py-1">{count(p.quantity * ot.quantity)}</td>
              <td className="num whitespace-nowrap px-1.5 py-1 font-semibold">{tapeLength(p.length)}</td>
              <td className="num whitespace-nowrap px-1.5 py-1">{p.width === undefined ? "—" : inchesText(p.width)}</td>
              <td className="px-1.5 py-1 text-xs">
                <EndsCell ends={p.ends} />
                <CutDetails piece={p} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
