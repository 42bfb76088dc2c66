"use client";

import { useState } from "react";
import type { SheetView } from "@/lib/plans/api-types";
import { STANDARD_SCALES, distance, type Point, type ScaleFamily } from "@/lib/plans/calibration";
import { formatLength } from "@/takeoff";
import { LengthForm } from "./length-form";
import { ScaleCheck } from "./scale-check";
import { ScaleWarning } from "./scale-warning";
import type { Tool } from "./tools";
import type { SheetPatch } from "./use-sheet-data";

const FAMILIES: [ScaleFamily, string][] = [
  ["architectural", "Architectural"],
  ["engineering", "Engineering"],
  ["metric", "Metric"],
];

interface Props {
  sheet: SheetView;
  canWrite: boolean;
  tool: Tool;
  picks: Point[];
  setTool: (t: Tool) => void;
  /** Resolves true once saved (a refusal is shown by the viewer). */
  save: (patch: SheetPatch) => Promise<boolean>;
  saving: boolean;
}

const feet = (inches: number) => formatLength(inches, { style: "feet-inches" });
/** PDF user-space units are 1/72 in of paper times the page's UserUnit (ISO 32000-1, 8.3.2.3 and 14.11.2). */
const paperInches = (units: number, userUnit: number) => ((units * userUnit) / 72).toFixed(2);

export function CalibrationPanel({ sheet, canWrite, tool, picks, setTool, save, saving }: Props) {
  const [scaleId, setScaleId] = useState("");
  const [offerCheck, setOfferCheck] = useState(false);
  const [a, b] = picks;
  const calibrated = sheet.inchesPerUnit !== null;
  const pointsInEffect = !!sheet.calibrationPoints;

  async function savePoints(text: string) {
    if (!a || !b) return;
    if (!(await save({ calibrationPoints: { ax: a.x, ay: a.y, bx: b.x, by: b.y, length: text } }))) return;
    setOfferCheck(true);
    setTool("move");
  }
  async function saveScale() {
    const s = STANDARD_SCALES.find((x) => x.id === scaleId);
    if (!s) return;
    if (await save({ scale: { ratio: s.ratio, label: s.label } })) setOfferCheck(true);
  }

  return (
    <section aria-labelledby="cal-title" className="space-y-2">
      <h3 id="cal-title" className="text-sm font-semibold">
        Calibration
      </h3>
      <dl className="grid grid-cols-[5.5rem_1fr] gap-y-0.5 text-xs">
        <dt className="text-graphite-600">Scale from</dt>
        <dd className="font-medium">
          {!calibrated ? "nothing yet: not calibrated" : pointsInEffect ? "two picked points" : `the standard scale ${sheet.scaleLabel ?? ""}`}
        </dd>
        {sheet.calibrationPoints && (
          <>
            <dt className="text-graphite-600">Points</dt>
            <dd>{feet(sheet.calibrationPoints.inches)} apart in real life</dd>
          </>
        )}
        {pointsInEffect && sheet.scaleLabel && (
          <>
            <dt className="text-graphite-600">Check against</dt>
            <dd>the standard scale {sheet.scaleLabel}</dd>
          </>
        )}
      </dl>
      {sheet.scaleMismatchPercent !== null && <ScaleWarning percent={sheet.scaleMismatchPercent} />}
      {!calibrated && <p className="text-xs text-graphite-700">Until the sheet is calibrated, measuring and width checks are off.</p>}

      {canWrite && tool === "calibrate" && (
        <div className="rounded-md border border-brass-400 bg-white p-2">
          {a && b ? (
            <LengthForm
              id="cal-length"
              label={`Known length between the points (${paperInches(distance(a, b), sheet.userUnit)} in apart on paper)`}
              submit="Save"
              busy={saving}
              onSubmit={(text) => void savePoints(text)}
              onCancel={() => setTool("move")}
            />
          ) : (
            <p className="text-xs">
              Click {a ? "the other end" : "one end"} of a dimension whose length you know. The longer it is, the truer the scale.{" "}
              <button type="button" className="text-spruce-700 underline" onClick={() => setTool("move")}>
                Cancel
              </button>
            </p>
          )}
        </div>
      )}
      {canWrite && tool !== "calibrate" && tool !== "check" && (
        <button type="button" onClick={() => setTool("calibrate")} className="w-full rounded-md border border-graphite-400 bg-white px-2 py-1 text-sm font-medium hover:bg-maple-100">
          {pointsInEffect ? "Pick the points again" : "Calibrate from two points"}
        </button>
      )}

      {canWrite && (
        <div className="flex gap-1.5">
          <label htmlFor="std-scale" className="sr-only">
            Standard scale
          </label>
          <select id="std-scale" value={scaleId} onChange={(e) => setScaleId(e.target.value)} className="min-w-0 flex-1 rounded-md border border-graphite-400 bg-white px-1.5 py-1 text-sm">
            <option value="">Standard scale…</option>
            {FAMILIES.map(([family, name]) => (
              <optgroup key={family} label={name}>
                {STANDARD_SCALES.filter((s) => s.family === family).map((s) => (
                  <option key={s.id} value={s.id}>
                    {s.label}
                  </option>
                ))}
              </optgroup>
            ))}
          </select>
          <button type="button" disabled={!scaleId || saving} onClick={() => void saveScale()} className="rounded-md bg-spruce-700 px-2.5 text-sm font-semibold text-maple-50 hover:bg-spruce-800 disabled:bg-graphite-400">
            Use
          </button>
        </div>
      )}
      {canWrite && (sheet.scaleLabel || sheet.calibrationPoints) && (
        <p className="flex gap-3 text-xs">
          {sheet.calibrationPoints && (
            <button type="button" className="text-spruce-700 underline" disabled={saving} onClick={() => void save({ calibrationPoints: null })}>
              Remove points
            </button>
          )}
          {sheet.scaleLabel && (
            <button type="button" className="text-spruce-700 underline" disabled={saving} onClick={() => void save({ scale: null })}>
              Remove scale
            </button>
          )}
        </p>
      )}

      {calibrated && tool === "check" && (
        <div className="rounded-md border border-graphite-400 bg-white p-2">
          <ScaleCheck key={picks.length} picks={picks} inchesPerUnit={sheet.inchesPerUnit!} onCancel={() => setTool("move")} />
        </div>
      )}
      {calibrated && tool !== "check" && tool !== "calibrate" && (
        <button
          type="button"
          onClick={() => {
            setOfferCheck(false);
            setTool("check");
          }}
          className={`w-full rounded-md border px-2 py-1 text-sm font-medium hover:bg-maple-100 ${offerCheck ? "border-brass-500 bg-maple-100" : "border-graphite-400 bg-white"}`}
        >
          {offerCheck ? "Saved. Check it on a second dimension" : "Check against a second dimension"}
        </button>
      )}
    </section>
  );
}
