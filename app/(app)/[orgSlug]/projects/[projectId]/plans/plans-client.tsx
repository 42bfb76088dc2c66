"use client";

import { Notice } from "@/components/ui/card";
import { ConfirmRemoval, RemovalSummary } from "@/components/plans/confirm-removal";
import { CountWarnings } from "@/components/plans/sheet-list/count-warnings";
import { useRemoval } from "@/components/plans/sheet-list/use-removal";
import type { SheetView } from "@/lib/plans/api-types";
import { sheetsImpact } from "@/lib/plans/removal-impact";
import { PlanUpload } from "@/components/plans/plan-upload";
import { JobCountsTable } from "@/components/plans/sheet-list/job-counts-table";
import { SheetList } from "@/components/plans/sheet-list/sheet-list";
import { UnitTypesEditor } from "@/components/plans/sheet-list/unit-types-editor";
import { usePlansData } from "@/components/plans/sheet-list/use-plans-data";

export function PlansView({ orgSlug, projectId, canWrite }: { orgSlug: string; projectId: string; canWrite: boolean }) {
  const data = usePlansData(orgSlug, projectId);
  const { sheets, unitTypes, counts, openingTypes } = data;
  const units = unitTypes.data ?? [];
  const removal = useRemoval(orgSlug, projectId);
  const warnings = counts.data?.warnings ?? [];
  const warningsFor = (sheetId: string) => warnings.filter((w) => w.sheetIds.includes(sheetId)).map((w) => w.message);
  const impactOf = (ids: string[]) => (counts.data ? sheetsImpact(counts.data, new Set(ids)) : { tags: 0, openings: 0 });
  const removeSheet = (sheet: SheetView) =>
    removal.ask({
      title: `Delete sheet ${sheet.label}?`,
      confirmLabel: "Delete sheet",
      path: `${data.base}/sheets/${sheet.id}?version=${sheet.version}`,
      // The sheet's own tag count is what the server checks; the counts say how many openings they are.
      ...impactOf([sheet.id]),
      tags: sheet.tagCount,
    });
  const removeSet = (planSetId: string, name: string, setSheets: SheetView[]) =>
    removal.ask({
      title: `Delete plan set ${name} (${setSheets.length} sheet${setSheets.length === 1 ? "" : "s"})?`,
      confirmLabel: "Delete plan set",
      path: `${data.base}/plan-sets/${planSetId}`,
      ...impactOf(setSheets.map((s) => s.id)),
      tags: setSheets.reduce((n, s) => n + s.tagCount, 0),
    });

  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-bold">Plans</h1>
      <CountWarnings warnings={warnings} />
      {canWrite && (
        <section aria-label="Upload a plan set">
          <PlanUpload orgSlug={orgSlug} projectId={projectId} onUploaded={data.refetch} />
        </section>
      )}
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_18rem]">
        <section aria-labelledby="sheets-heading" className="min-w-0 space-y-3">
          <h2 id="sheets-heading" className="text-base font-semibold">
            Sheets
          </h2>
          {(sheets.isPending || unitTypes.isPending) && <p className="text-sm text-graphite-600">Loading sheets…</p>}
          {sheets.isError && <Notice tone="error">{sheets.error.message}</Notice>}
          {/* Sheets wait for the unit types, so a sheet's picker never shows a unit type it cannot name. */}
          {sheets.data && unitTypes.data && (
            <SheetList
              orgSlug={orgSlug}
              projectId={projectId}
              sheets={sheets.data}
              unitTypes={units}
              canWrite={canWrite}
              notices={data.notices}
              onDismiss={data.dismiss}
              onSave={data.saveSheet}
              warningsFor={warningsFor}
              onRemoveSheet={removeSheet}
              onRemoveSet={removeSet}
            />
          )}
        </section>
        <aside className="space-y-6">
          {unitTypes.isError && <Notice tone="error">{unitTypes.error.message}</Notice>}
          {unitTypes.data && <UnitTypesEditor base={data.base} unitTypes={units} canWrite={canWrite} onChanged={data.unitTypesChanged} />}
        </aside>
      </div>
      {counts.isError && <Notice tone="error">Counts are unavailable: {counts.error.message}</Notice>}
      {counts.data && openingTypes.data && <JobCountsTable counts={counts.data} openingTypes={openingTypes.data} />}
      <ConfirmRemoval
        open={removal.pending !== null}
        title={removal.pending?.title ?? ""}
        confirmLabel={removal.pending?.confirmLabel ?? "Delete"}
        busy={removal.busy}
        error={removal.error}
        onConfirm={() => void removal.confirm()}
        onCancel={removal.cancel}
      >
        {removal.pending && <RemovalSummary tags={removal.pending.tags} openings={removal.pending.openings} />}
      </ConfirmRemoval>
    </div>
  );
}
