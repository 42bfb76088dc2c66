import type { SheetView } from "@/lib/plans/api-types";

/**
 * How a sheet is calibrated, in words with a mark beside them: the mark's shape differs per state, so
 * neither the colour nor the mark alone carries the meaning.
 */
export function CalibrationStatus({ sheet }: { sheet: SheetView }) {
  const mismatch = sheet.scaleMismatchPercent;
  let state: { mark: string; text: string; look: string };
  if (sheet.inchesPerUnit === null) {
    state = { mark: "○", text: "Not calibrated", look: "text-graphite-600" };
  } else if (sheet.calibrationPoints) {
    state = { mark: "✓", text: "Calibrated by points", look: "text-spruce-800" };
  } else {
    state = { mark: "✓", text: `Calibrated by scale${sheet.scaleLabel ? ` ${sheet.scaleLabel}` : ""}`, look: "text-spruce-800" };
  }
  return (
    <div className="space-y-0.5 text-xs">
      <p className={`flex items-start gap-1 font-medium ${state.look}`}>
        <span aria-hidden className="w-3 shrink-0 text-center">
          {state.mark}
        </span>
        <span>{state.text}</span>
      </p>
      {sheet.calibrationPoints && sheet.scaleLabel && mismatch === null && (
        <p className="pl-4 text-graphite-600">agrees with {sheet.scaleLabel}</p>
      )}
      {mismatch !== null && (
        <p className="flex items-start gap-1 rounded bg-brass-300/30 px-1 py-0.5 font-medium text-brass-700">
          <span aria-hidden className="w-3 shrink-0 text-center">
            ⚠
          </span>
          <span>
            Points and scale {sheet.scaleLabel ?? ""} differ by <span className="num">{mismatch.toFixed(1)}%</span>
          </span>
        </p>
      )}
    </div>
  );
}
