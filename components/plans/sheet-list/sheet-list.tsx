"use client";

import type { SheetView, UnitTypeView } from "@/lib/plans/api-types";
import { PlanSetGroup } from "./plan-set-group";
import type { SheetNotice, SheetPatch } from "./use-plans-data";

/** Sheets come ordered by plan set (oldest first), then page: group them in that order. */
function byPlanSet(sheets: SheetView[]) {
  const groups = new Map<string, { name: string; sheets: SheetView[] }>();
  for (const s of sheets) {
    const group = groups.get(s.planSetId) ?? { name: s.planSetName, sheets: [] };
    group.sheets.push(s);
    groups.set(s.planSetId, group);
  }
  return [...groups.entries()];
}

export function SheetList(props: {
  orgSlug: string;
  projectId: string;
  sheets: SheetView[];
  unitTypes: UnitTypeView[];
  canWrite: boolean;
  notices: Record<string, SheetNotice>;
  onDismiss: (sheetId: string) => void;
  onSave: (sheet: SheetView, patch: SheetPatch) => Promise<Record<string, string> | null>;
  warningsFor: (sheetId: string) => string[];
  onRemoveSheet: (sheet: SheetView) => void;
  onRemoveSet: (planSetId: string, name: string, sheets: SheetView[]) => void;
}) {
  const { sheets, ...rest } = props;
  if (sheets.length === 0) {
    return (
      <p className="rounded-lg border border-dashed border-maple-300 bg-white p-6 text-sm text-graphite-700">
        No sheets yet. {props.canWrite ? "Upload the architect's plan set (PDF); each page becomes a sheet." : "An estimator uploads the plan set."}
      </p>
    );
  }
  return (
    <div className="space-y-4">
      {byPlanSet(sheets).map(([planSetId, group]) => (
        <PlanSetGroup key={planSetId} planSetId={planSetId} name={group.name} sheets={group.sheets} {...rest} />
      ))}
    </div>
  );
}
