import type { MaterialTotal } from "@/takeoff";
import { count, feet } from "@/lib/takeoffs/format";
import { MATERIAL_LABELS } from "@/lib/takeoffs/labels";
import type { TakeoffResult } from "@/takeoff";

const TH = "px-2 py-1.5 font-semibold";
const TD = "num px-2 py-1";

function Rows({ one, all }: { one: MaterialTotal[] | null; all: MaterialTotal[] }) {
  if (all.length === 0) {
    return (
      <tr className="border-t border-maple-100">
        <td colSpan={5} className="px-2 py-1 text-graphite-600">
          No tagged openings.
        </td>
      </tr>
    );
  }
  return all.map((t) => {
    const u = one?.find((x) => x.material === t.material);
    return (
      <tr key={t.material} className="border-t border-maple-100">
        <th scope="row" className="px-2 py-1 pl-5 text-left font-normal">
          {MATERIAL_LABELS[t.material]}
        </th>
        <td className={TD}>{u ? count(u.pieces) : "—"}</td>
        <td className={TD}>{u ? feet(u.linearFeet) : "—"}</td>
        <td className={TD}>{count(t.pieces)}</td>
        <td className={`${TD} font-semibold`}>{feet(t.linearFeet)}</td>
      </tr>
    );
  });
}

/** Pieces and linear feet per material: for one unit of each type, for all units of it, and for common areas. */
export function UnitTypeTotals({ result }: { result: TakeoffResult }) {
  return (
    <div className="relative max-w-3xl overflow-x-auto rounded-lg border border-maple-200 bg-white">
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">Pieces and linear feet per material, per unit type and for common areas</caption>
        <thead className="bg-maple-100 text-graphite-700">
          <tr>
            <th scope="col" rowSpan={2} className={`${TH} text-left align-bottom`}>
              Material
            </th>
            <th scope="colgroup" colSpan={2} className={`${TH} text-right`}>
              One unit
            </th>
            <th scope="colgroup" colSpan={2} className={`${TH} text-right`}>
              All units
            </th>
          </tr>
          <tr>
            <th scope="col" className={`${TH} text-right`}>Pieces</th>
            <th scope="col" className={`${TH} text-right`}>Linear ft</th>
            <th scope="col" className={`${TH} text-right`}>Pieces</th>
            <th scope="col" className={`${TH} text-right`}>Linear ft</th>
          </tr>
        </thead>
        {result.unitTypes.map((u) => (
          <tbody key={u.unitTypeId}>
            <tr className="border-t border-maple-200 bg-maple-50">
              <th scope="rowgroup" colSpan={5} className="px-2 py-1.5 text-left font-semibold">
                {u.name} <span className="font-normal text-graphite-700">· {count(u.unitCount)} unit{u.unitCount === 1 ? "" : "s"}</span>
              </th>
            </tr>
            <Rows one={u.perUnit} all={u.allUnits} />
          </tbody>
        ))}
        <tbody>
          <tr className="border-t border-maple-200 bg-maple-50">
            <th scope="rowgroup" colSpan={5} className="px-2 py-1.5 text-left font-semibold">
              Common areas <span className="font-normal text-graphite-700">· counted once</span>
            </th>
          </tr>
          <Rows one={null} all={result.commonAreas} />
        </tbody>
      </table>
    </div>
  );
}
