import { Card } from "@/components/ui/card";
import type { CountByType, CountsView, OpeningTypeView } from "@/lib/plans/api-types";

const sum = (c: CountByType) => Object.values(c).reduce((a, b) => a + b, 0);

function Count({ n, each }: { n: number; each?: number }) {
  if (n === 0) return <span className="text-graphite-400">–<span className="sr-only">0</span></span>;
  return (
    <>
      {n}
      {each !== undefined && each !== n && <span className="block text-[0.65rem] leading-tight text-graphite-600">{each} per unit</span>}
    </>
  );
}

/** Openings per unit type and opening type, common areas, and the job: a compact check before the takeoff. */
export function JobCountsTable({ counts, openingTypes }: { counts: CountsView; openingTypes: OpeningTypeView[] }) {
  const types = [...openingTypes].sort((a, b) => a.mark.localeCompare(b.mark, undefined, { numeric: true }));
  const cell = "num px-2 py-1.5 align-top";
  return (
    <Card
      title="Openings in the job"
      actions={
        <p className="text-sm text-graphite-700">
          Total <span className="num font-semibold">{counts.jobTotal}</span>
        </p>
      }
    >
      <p className="mb-2 text-xs text-graphite-700">
        Unit types count from their counted sheets only; reference views (enlarged plans, repeats) add nothing.
      </p>
      {types.length === 0 ? (
        <p className="text-sm text-graphite-600">The window list is empty: add opening types, then tag them on the sheets.</p>
      ) : (
        <div className="relative overflow-x-auto">
          <table className="w-full border-collapse text-sm">
            <caption className="sr-only">Openings per unit type (all units of it) and for the whole job, by opening type</caption>
            <thead className="border-b border-maple-200 text-graphite-700">
              <tr>
                <th scope="col" className="px-2 py-1.5 text-left font-semibold">
                  Where
                </th>
                {types.map((t) => (
                  <th key={t.id} scope="col" className="num px-2 py-1.5 font-semibold">
                    {t.mark}
                  </th>
                ))}
                <th scope="col" className="num px-2 py-1.5 font-semibold">
                  All
                </th>
              </tr>
            </thead>
            <tbody>
              {counts.unitTypes.map((u) => (
                <tr key={u.unitTypeId} className="border-b border-maple-100">
                  <th scope="row" className="whitespace-nowrap px-2 py-1.5 text-left font-medium">
                    {u.name} <span className="num font-normal text-graphite-600">× {u.unitCount}</span>
                  </th>
                  {types.map((t) => (
                    <td key={t.id} className={cell}>
                      <Count n={u.allUnits[t.id] ?? 0} each={u.perUnit[t.id] ?? 0} />
                    </td>
                  ))}
                  <td className={`${cell} font-semibold`}>
                    <Count n={sum(u.allUnits)} />
                  </td>
                </tr>
              ))}
              <tr className="border-b border-maple-100">
                <th scope="row" className="whitespace-nowrap px-2 py-1.5 text-left font-medium">
                  Common areas <span className="font-normal text-graphite-600">(once)</span>
                </th>
                {types.map((t) => (
                  <td key={t.id} className={cell}>
                    <Count n={counts.commonAreas[t.id] ?? 0} />
                  </td>
                ))}
                <td className={`${cell} font-semibold`}>
                  <Count n={sum(counts.commonAreas)} />
                </td>
              </tr>
            </tbody>
            <tfoot>
              <tr className="border-t-2 border-graphite-400 font-semibold">
                <th scope="row" className="px-2 py-1.5 text-left">
                  Job
                </th>
                {types.map((t) => (
                  <td key={t.id} className={cell}>
                    <Count n={counts.job[t.id] ?? 0} />
                  </td>
                ))}
                <td className={cell}>{counts.jobTotal}</td>
              </tr>
            </tfoot>
          </table>
        </div>
      )}
    </Card>
  );
}
