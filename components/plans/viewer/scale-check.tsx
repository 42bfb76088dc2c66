"use client";

import { useState } from "react";
import { measureInches, type Point } from "@/lib/plans/calibration";
import { formatLength } from "@/takeoff";
import { LengthForm } from "./length-form";

const feet = (inches: number) => formatLength(inches, { style: "feet-inches" });

/** After calibrating: measure a second known dimension and see how far off the calibration reads it. */
export function ScaleCheck({ picks, inchesPerUnit, onCancel }: { picks: Point[]; inchesPerUnit: number; onCancel: () => void }) {
  const [truth, setTruth] = useState<number | null>(null);
  const [a, b] = picks;
  if (!a || !b) return <p className="text-xs text-graphite-700">Click both ends of a second dimension whose length is printed on the sheet.</p>;
  const measured = measureInches(a, b, inchesPerUnit);
  if (truth === null) return <LengthForm id="check-length" label={`Reads ${feet(measured)}. Its true length:`} submit="Check" onSubmit={(_, inches) => setTruth(inches)} onCancel={onCancel} />;
  const off = measured - truth;
  const pct = (Math.abs(off) / truth) * 100;
  const good = pct <= 1;
  return (
    <div role="status" className={`space-y-1 rounded-md border px-2 py-1.5 text-xs ${good ? "border-spruce-600 bg-spruce-50" : "border-brass-500 bg-maple-100"}`}>
      <p className="font-semibold">
        {good ? "✓ Calibration checks out" : "⚠ Calibration is off"}: {off === 0 ? "exact" : `${off > 0 ? "long" : "short"} by ${formatLength(Math.abs(off))}`} ({pct.toFixed(2)}%)
      </p>
      <p>
        Measured {feet(measured)} against {feet(truth)}.{good ? "" : " More than 1%: pick the calibration points again on a longer dimension."}
      </p>
      <button type="button" onClick={onCancel} className="text-spruce-700 underline">
        Done
      </button>
    </div>
  );
}
