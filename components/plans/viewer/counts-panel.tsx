"use client";

import type { CountByType, CountsView, OpeningTypeView } from "@/lib/plans/api-types";
import { Swatch } from "./tag-panel";

const n = (c: CountByType | undefined, id: string) => c?.[id] ?? 0;
const sum = (c: CountByType | undefined) => Object.values(c ?? {}).reduce((a, b) => a + b, 0);

/** Openings by type: on this sheet, for its unit type (one unit and all of them) and for the whole job. */
export function CountsPanel({ counts, types, sheetId, unitTypeId }: { counts: CountsView | undefined; types: OpeningTypeView[]; sheetId: string; unitTypeId: string | null }) {
  if (!counts) return <p className="text-xs text-graphite-600">Loading counts…</p>;
  const sheet = counts.sheets.find((s) => s.sheetId === sheetId);
  const unit = unitTypeId ? counts.unitTypes.find((u) => u.unitTypeId === unitTypeId) : undefined;
  const rows = types.map((t, i) => ({ t, i })).filter(({ t }) => n(counts.job, t.id) > 0 || n(sheet?.byType, t.id) > 0);
  return (
    <section aria-labelledby="counts-title" className="space-y-1.5">
      <h3 id="counts-title" className="text-sm font-semibold">
        Counts
      </h3>
      <p className="text-xs text-graphite-700">
        {unit ? (
          <>
            Unit type <strong>{unit.name}</strong>: tags here count once per unit, × {unit.unitCount}.
          </>
        ) : (
          "Common area (no unit type): tags here count once."
        )}
      </p>
      {rows.length === 0 ? (
        <p className="text-xs text-graphite-600">No tags in this project yet.</p>
      ) : (
        <table className="w-full text-xs">
          <thead className="text-graphite-600">
            <tr>
              <th scope="col" className="py-0.5 text-left font-medium">
                Type
              </th>
              <th scope="col" className="num font-medium">
                Sheet
              </th>
              {unit && (
                <th scope="col" className="num font-medium" title={`All ${unit.unitCount} units of ${unit.name}`}>
                  {unit.name} ×{unit.unitCount}
                </th>
              )}
              <th scope="col" className="num font-medium">
                Job
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.map(({ t, i }) => (
              <tr key={t.id} className="border-t border-maple-200">
                <th scope="row" className="py-0.5 text-left font-normal">
                  <Swatch index={i} mark={t.mark} />
                </th>
                <td className="num">{n(sheet?.byType, t.id)}</td>
                {unit && <td className="num">{n(unit.allUnits, t.id)}</td>}
                <td className="num font-semibold">{n(counts.job, t.id)}</td>
              </tr>
            ))}
            <tr className="border-t-2 border-graphite-400 font-semibold">
              <th scope="row" className="py-0.5 text-left">
                Total
              </th>
              <td className="num">{sheet?.total ?? 0}</td>
              {unit && <td className="num">{sum(unit.allUnits)}</td>}
              <td className="num">{counts.jobTotal}</td>
            </tr>
          </tbody>
        </table>
      )}
    </section>
  );
}
