"use client";

import type { CountByType, CountsView, OpeningTypeView } from "@/lib/plans/api-types";
import { Swatch } from "./tag-panel";

const n = (c: CountByType | undefined, id: string) => c?.[id] ?? 0;
const sum = (c: CountByType | undefined) => Object.values(c ?? {}).reduce((a, b) => a + b, 0);

/**
 * Openings by type: the tags on this sheet, what its unit type counts (one unit, and all of them — from
 * its counted sheets, which may not include this one) and the whole job. Each column says which.
 */
export function CountsPanel({ counts, types, sheetId, unitTypeId }: { counts: CountsView | undefined; types: OpeningTypeView[]; sheetId: string; unitTypeId: string | null }) {
  if (!counts) return <p className="text-xs text-graphite-600">Loading counts…</p>;
  const sheet = counts.sheets.find((s) => s.sheetId === sheetId);
  const unit = unitTypeId ? counts.unitTypes.find((u) => u.unitTypeId === unitTypeId) : undefined;
  const rows = types.map((t, i) => ({ t, i })).filter(({ t }) => n(counts.job, t.id) > 0 || n(sheet?.byType, t.id) > 0);
  const reference = sheet?.countRole === "reference";
  const countedFrom = unit ? counts.sheets.filter((s) => s.unitTypeId === unit.unitTypeId && s.countRole === "counted").map((s) => s.label) : [];
  const warnings = counts.warnings.filter((w) => w.sheetIds.includes(sheetId));
  return (
    <section aria-labelledby="counts-title" className="space-y-1.5">
      <h3 id="counts-title" className="text-sm font-semibold">
        Counts
      </h3>
      <p className="text-xs text-graphite-700">
        {reference ? (
          <>
            <strong>◇ Reference view:</strong> tags here count for nothing.
            {unit && (countedFrom.length > 0 ? ` ${unit.name} is counted from ${countedFrom.join(", ")}.` : ` No sheet counts for ${unit.name} yet.`)}
          </>
        ) : unit ? (
          <>
            Unit type <strong>{unit.name}</strong>: tags here count once per unit, × {unit.unitCount}.
            {countedFrom.length > 1 && ` ${unit.name} adds up ${countedFrom.length} counted sheets: ${countedFrom.join(", ")}.`}
          </>
        ) : (
          "Common area (no unit type): tags here count once."
        )}
      </p>
      {warnings.map((w) => (
        <p key={w.message} role="status" className="rounded border border-brass-500 bg-maple-100 px-2 py-1 text-xs text-graphite-900">
          <span aria-hidden>△ </span>
          {w.message}
        </p>
      ))}
      {rows.length === 0 ? (
        <p className="text-xs text-graphite-600">No tags in this project yet.</p>
      ) : (
        <table className="w-full text-xs">
          <thead className="text-graphite-600">
            <tr>
              <th scope="col" className="py-0.5 text-left font-medium">
                Type
              </th>
              <th scope="col" className="num font-medium" title="Tags placed on this sheet">
                This sheet
              </th>
              {unit && (
                <>
                  <th scope="col" className="num font-medium" title={`What ${unit.name} counts for one unit, from its counted sheets`}>
                    {unit.name}, 1 unit
                  </th>
                  <th scope="col" className="num font-medium" title={`One unit × ${unit.unitCount} units of ${unit.name}`}>
                    All {unit.unitCount}
                  </th>
                </>
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
                {unit && (
                  <>
                    <td className="num">{n(unit.perUnit, t.id)}</td>
                    <td className="num">{n(unit.allUnits, t.id)}</td>
                  </>
                )}
                <td className="num font-semibold">{n(counts.job, t.id)}</td>
              </tr>
            ))}
            <tr className="border-t-2 border-graphite-400 font-semibold">
              <th scope="row" className="py-0.5 text-left">
                Total
              </th>
              <td className="num">{sheet?.total ?? 0}</td>
              {unit && (
                <>
                  <td className="num">{sum(unit.perUnit)}</td>
                  <td className="num">{sum(unit.allUnits)}</td>
                </>
              )}
              <td className="num">{counts.jobTotal}</td>
            </tr>
          </tbody>
        </table>
      )}
    </section>
  );
}
