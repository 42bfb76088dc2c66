"use client";

import Link from "next/link";
import { useState } from "react";
import type { SheetView, UnitTypeView } from "@/lib/plans/api-types";
import { CalibrationStatus } from "./calibration-status";
import { SheetLabelEditor } from "./sheet-label-editor";
import { SheetThumbnail } from "./sheet-thumbnail";
import type { SheetNotice, SheetPatch } from "./use-plans-data";

export interface SheetRowProps {
  sheet: SheetView;
  href: string;
  unitTypes: UnitTypeView[];
  canWrite: boolean;
  notice: SheetNotice | undefined;
  onDismiss: (sheetId: string) => void;
  onSave: (sheet: SheetView, patch: SheetPatch) => Promise<Record<string, string> | null>;
  /** Count warnings that name this sheet (a repeated layout, a unit type counting nothing). */
  warnings: string[];
  onRemove: (sheet: SheetView) => void;
}

/** One sheet: its picture, label, unit type, calibration and tags, and the way into the viewer. */
export function SheetRow({ sheet, href, unitTypes, canWrite, notice, onDismiss, onSave, warnings, onRemove }: SheetRowProps) {
  const [editingLabel, setEditingLabel] = useState(false);
  const [unitError, setUnitError] = useState<string | null>(null);
  const unitName = (id: string | null) => (id ? (unitTypes.find((u) => u.id === id)?.name ?? "Unknown unit type") : "Common area (counts once)");

  async function changeUnitType(value: string) {
    setUnitError(null);
    const fields = await onSave(sheet, { unitTypeId: value || null });
    if (fields) setUnitError(Object.values(fields).join(" "));
  }

  async function changeRole(value: SheetView["countRole"]) {
    setUnitError(null);
    const fields = await onSave(sheet, { countRole: value });
    if (fields) setUnitError(Object.values(fields).join(" "));
  }
  const countsAs = sheet.unitTypeId ? `Counts for ${unitName(sheet.unitTypeId)}` : "Counts once (common area)";

  return (
    <li className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-2 border-b border-maple-100 py-3 last:border-0 sm:grid-cols-[8.25rem_minmax(7rem,1fr)_minmax(11.5rem,14rem)_minmax(9rem,11rem)_auto]">
      <Link href={href} tabIndex={-1} aria-hidden className="row-span-4 flex w-[8.25rem] justify-center self-start sm:row-span-1">
        <SheetThumbnail sheet={sheet} />
      </Link>
      <div className="min-w-0">
        {editingLabel ? (
          <SheetLabelEditor
            sheetId={sheet.id}
            label={sheet.label}
            version={sheet.version}
            onSave={(label) => onSave(sheet, { label })}
            onClose={() => setEditingLabel(false)}
          />
        ) : (
          <p className="flex flex-wrap items-baseline gap-x-2">
            <Link href={href} className="font-semibold text-graphite-900 underline decoration-maple-300 underline-offset-2 hover:decoration-spruce-700">
              {sheet.label}
            </Link>
            {canWrite && (
              <button type="button" className="text-xs font-medium text-spruce-700 underline" onClick={() => setEditingLabel(true)} aria-label={`Rename ${sheet.label}`}>
                Rename
              </button>
            )}
          </p>
        )}
        <p className="text-xs text-graphite-600">
          Page <span className="num">{sheet.pageNumber}</span> · <span className="num">{sheet.tagCount}</span> tag{sheet.tagCount === 1 ? "" : "s"}
        </p>
      </div>
      <div className="min-w-0 text-sm">
        {canWrite ? (
          <>
            <label htmlFor={`unit-${sheet.id}`} className="sr-only">
              Unit type of {sheet.label}
            </label>
            <select
              id={`unit-${sheet.id}`}
              className="w-full rounded border border-graphite-400 bg-white px-2 py-1 text-sm"
              value={sheet.unitTypeId ?? ""}
              onChange={(e) => void changeUnitType(e.target.value)}
              aria-invalid={unitError ? true : undefined}
            >
              <option value="">Common area (once)</option>
              {unitTypes.map((u) => (
                <option key={u.id} value={u.id}>
                  {u.name} (× {u.count})
                </option>
              ))}
            </select>
            <label htmlFor={`role-${sheet.id}`} className="sr-only">
              Counting of {sheet.label}
            </label>
            <select
              id={`role-${sheet.id}`}
              className="mt-1 w-full rounded border border-graphite-400 bg-white px-2 py-1 text-xs"
              value={sheet.countRole}
              onChange={(e) => void changeRole(e.target.value as SheetView["countRole"])}
            >
              <option value="counted">{countsAs}</option>
              <option value="reference">Reference view (not counted)</option>
            </select>
            {unitError && (
              <p role="alert" className="mt-1 text-xs font-medium text-alarm-700">
                ⚠ {unitError}
              </p>
            )}
          </>
        ) : (
          <>
            <span className={sheet.unitTypeId ? "" : "text-graphite-600"}>{unitName(sheet.unitTypeId)}</span>
            {sheet.countRole === "reference" && <span className="block text-xs text-graphite-700">◇ Reference view (not counted)</span>}
          </>
        )}
      </div>
      <CalibrationStatus sheet={sheet} />
      <div className="flex flex-col items-end gap-1 self-start">
        <Link href={href} className="whitespace-nowrap rounded-md border border-graphite-400 bg-white px-2.5 py-1 text-xs font-semibold text-graphite-900 hover:bg-maple-100">
          Open sheet →
        </Link>
        {canWrite && (
          <button type="button" className="text-xs font-medium text-alarm-700 underline" onClick={() => onRemove(sheet)} aria-label={`Delete sheet ${sheet.label}`}>
            Delete
          </button>
        )}
      </div>
      {warnings.map((w) => (
        <p key={w} className="col-span-full rounded-md border border-brass-500 bg-maple-100 px-3 py-1.5 text-xs text-graphite-900 sm:col-start-2" data-warning="counts">
          <span aria-hidden>△ </span>
          <span className="font-semibold">Check the count: </span>
          {w}
        </p>
      ))}
      {notice && (
        <div role="alert" className="col-span-full rounded-md border border-alarm-600 bg-alarm-50 px-3 py-2 text-xs text-alarm-700 sm:col-start-2">
          ⚠ {notice.text}
          {notice.current
            ? ` Now: label “${notice.current.label}”, ${notice.current.unitTypeId ? `unit type “${unitName(notice.current.unitTypeId)}”` : "no unit type (common area)"}.`
            : " The sheet is no longer in this project."}{" "}
          <button type="button" className="font-semibold text-graphite-700 underline" onClick={() => onDismiss(sheet.id)}>
            Dismiss
          </button>
        </div>
      )}
    </li>
  );
}
