"use client";

import type { SheetView } from "@/lib/plans/api-types";
import { PlanSetGroup, type PlanSetGroupProps } from "./plan-set-group";

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

/** The plans page's sheets, one group per uploaded PDF; the group takes the same props for its own sheets. */
export function SheetList(props: Omit<PlanSetGroupProps, "planSetId" | "name">) {
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
