"use client";

import { useMemo } from "react";
import { Notice } from "@/components/ui/card";
import { NewOpeningForm } from "@/components/plans/window-list/new-opening-form";
import type { WindowListRow } from "@/components/plans/window-list/table-columns";
import { PriceGapsBar } from "@/components/plans/window-list/price-gaps-bar";
import { usePriceGaps } from "@/components/plans/window-list/use-price-gaps";
import { useWindowList } from "@/components/plans/window-list/use-window-list";
import { WindowListContext } from "@/components/plans/window-list/window-list-context";
import { WindowListTable } from "@/components/plans/window-list/window-list-table";

export function OpeningsView({ orgSlug, projectId, canWrite }: { orgSlug: string; projectId: string; canWrite: boolean }) {
  const { types, counts, controls, added } = useWindowList(orgSlug, projectId, canWrite);
  const job = counts.data?.job;
  const sheetCounts = counts.data?.sheets;
  // Any edit of the list bumps a version: the gap check is re-read for it.
  const typesVersion = (types.data ?? []).map((t) => `${t.id}:${t.version}`).join();
  const priceGaps = usePriceGaps(orgSlug, projectId, typesVersion);
  const gapList = priceGaps.gaps.data?.gaps;
  // Stable rows: TanStack Table recomputes its models whenever the array changes.
  const rows = useMemo<WindowListRow[]>(
    () =>
      (types.data ?? []).map((t) => ({
        ...t,
        count: job?.[t.id] ?? 0,
        tags: (sheetCounts ?? []).reduce((n, s) => n + (s.byType[t.id] ?? 0), 0),
        gaps: gapList?.filter((g) => g.openingTypeId === t.id),
      })),
    [types.data, job, sheetCounts, gapList],
  );
  const total = counts.data?.jobTotal;

  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h1 className="text-2xl font-bold">Window list</h1>
        {total !== undefined && (
          <p className="text-sm text-graphite-700">
            <span className="num font-semibold">{total}</span> opening{total === 1 ? "" : "s"} tagged across the job
          </p>
        )}
      </div>
      {types.isError && <Notice tone="error">{types.error.message}</Notice>}
      {counts.isError && <Notice tone="error">Counts are unavailable: {counts.error.message}</Notice>}
      {types.isPending && <p className="text-sm text-graphite-600">Loading the window list…</p>}
      {types.data && types.data.length > 0 && <PriceGapsBar {...priceGaps} />}
      <WindowListContext value={controls}>
        {types.data && rows.length === 0 && (
          <p className="rounded-lg border border-dashed border-maple-300 bg-white p-6 text-sm text-graphite-700">
            No opening types yet.{canWrite ? " Add the first line of the window list below." : ""}
          </p>
        )}
        {rows.length > 0 && (
          <div className="space-y-2">
            <WindowListTable rows={rows} />
            <p className="text-xs text-graphite-600">
              <em>Italic</em> values are defaults this type does not set itself. “In job” counts tags on the drawings, times each unit type&apos;s
              number of units.
              {canWrite
                ? ` Click a value to change it; type lengths as you would write them (25 7/8, 2'-1 7/8", 635 mm). Enter saves, Esc cancels.`
                : " Your role can read the window list; estimators and admins edit it."}
            </p>
          </div>
        )}
      </WindowListContext>
      {canWrite && <NewOpeningForm orgSlug={orgSlug} projectId={projectId} onAdded={added} />}
    </div>
  );
}
