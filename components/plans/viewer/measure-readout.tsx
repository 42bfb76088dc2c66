"use client";

import { measureInches, type Point } from "@/lib/plans/calibration";
import { formatLength } from "@/takeoff";
import type { Measurement } from "./overlay-layer";

/** The last measurement, written out for reading and copying (the drawing shows it too, at the line). */
export function MeasureReadout({ measurement, live, inchesPerUnit }: { measurement: Measurement | null; live: { a: Point; b: Point } | null; inchesPerUnit: number | null }) {
  if (!inchesPerUnit) return null;
  const m = live ?? measurement;
  if (!m) return null;
  const inches = measureInches(m.a, m.b, inchesPerUnit);
  return (
    <p role="status" aria-live="polite" className="rounded-md border border-spruce-600 bg-spruce-50 px-2 py-1 text-sm">
      <span className="text-xs text-graphite-600">{live ? "Measuring" : "Measured"} </span>
      <strong className="tabular-nums">{formatLength(inches, { style: "feet-inches" })}</strong>
      <span className="text-xs text-graphite-600"> ({formatLength(inches)})</span>
    </p>
  );
}
