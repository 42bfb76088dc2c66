"use client";

import type { CalibrationPointsView } from "@/lib/plans/api-types";
import { constrainToAxis, measureInches, type Point } from "@/lib/plans/calibration";
import { toScreen, type ViewportLike } from "@/lib/plans/viewer/coordinates";
import { formatLength } from "@/takeoff";
import { DimensionLine } from "./dimension-line";
import { TWO_POINT_TOOLS, type Tool } from "./tools";

// Tool colours from the product palette; every line also carries its length in words on the drawing.
export const TOOL_COLORS = { calibrate: "#7a5e17", check: "#3a3e42", measure: "#245840", width: "#245840", saved: "#7a5e17" } as const;

export interface Measurement {
  a: Point;
  b: Point;
}

interface Props {
  vp: ViewportLike;
  tool: Tool;
  picks: Point[];
  hover: Point | null;
  shift: boolean;
  inchesPerUnit: number | null;
  saved: CalibrationPointsView | null;
  measurement: Measurement | null;
}

const feet = (inches: number) => formatLength(inches, { style: "feet-inches" });

/** Everything drawn over the sheet except tags: picked points, the live line to the pointer, the last result. */
export function OverlayLayer({ vp, tool, picks, hover, shift, inchesPerUnit, saved, measurement }: Props) {
  const s = (p: Point) => toScreen(vp, p);
  const first = picks[0];
  const second = picks[1] ?? (first && hover && TWO_POINT_TOOLS.includes(tool) ? (shift ? constrainToAxis(first, hover) : hover) : null);
  const live = picks.length < 2;
  const length = first && second && inchesPerUnit && tool !== "calibrate" ? feet(measureInches(first, second, inchesPerUnit)) : undefined;
  const color = tool === "move" || tool === "tag" ? TOOL_COLORS.measure : TOOL_COLORS[tool];
  const showSaved = saved && (tool === "calibrate" || tool === "check");

  return (
    <svg className="pointer-events-none absolute inset-0 h-full w-full overflow-visible" aria-hidden={!first && !measurement && !showSaved}>
      {showSaved && (
        <DimensionLine
          name="Calibration"
          a={s({ x: saved.ax, y: saved.ay })}
          b={s({ x: saved.bx, y: saved.by })}
          color={TOOL_COLORS.saved}
          text={`calibrated ${feet(saved.inches)}`}
        />
      )}
      {measurement && tool === "measure" && !first && (
        <DimensionLine
          name="Measurement"
          a={s(measurement.a)}
          b={s(measurement.b)}
          color={TOOL_COLORS.measure}
          text={inchesPerUnit ? feet(measureInches(measurement.a, measurement.b, inchesPerUnit)) : undefined}
        />
      )}
      {first && <DimensionLine name={tool} a={s(first)} b={second ? s(second) : null} color={color} text={length} dashed={live} />}
    </svg>
  );
}
