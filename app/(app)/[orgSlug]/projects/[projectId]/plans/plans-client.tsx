"use client";

import { Notice } from "@/components/ui/card";
import { PlanUpload } from "@/components/plans/plan-upload";
import { JobCountsTable } from "@/components/plans/sheet-list/job-counts-table";
import { SheetList } from "@/components/plans/sheet-list/sheet-list";
import { UnitTypesEditor } from "@/components/plans/sheet-list/unit-types-editor";
import { usePlansData } from "@/components/plans/sheet-list/use-plans-data";

export function PlansView({ orgSlug, projectId, canWrite }: { orgSlug: string; projectId: string; canWrite: boolean }) {
  const data = usePlansData(orgSlug, projectId);
  const { sheets, unitTypes, counts, openingTypes } = data;
  const units = unitTypes.data ?? [];

  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-bold">Plans</h1>
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
    </div>
  );
}
