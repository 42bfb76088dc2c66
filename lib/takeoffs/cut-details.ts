import type { CutPiece, End } from "@/takeoff";
import { inchesText } from "./format";

/**
 * Degrees as a saw's scale reads them: 22 1/2°, 45°, 11 1/4°; other values to a tenth (the engine gives
 * hundredths, finer than any miter gauge is set).
 */
export function angleText(deg: number): string {
  const quarters = Math.round(deg * 4);
  if (Math.abs(deg * 4 - quarters) < 0.02) {
    const whole = Math.floor(quarters / 4);
    const frac = ["", "1/4", "1/2", "3/4"][quarters % 4]!;
    if (!frac) return `${whole}°`;
    return whole === 0 ? `${frac}°` : `${whole} ${frac}°`;
  }
  return `${(Math.round(deg * 10) / 10).toFixed(1)}°`;
}

const END_WORD: Record<End, string> = { square: "square", miter: "miter", return: "return miter", bevel: "bevel", scarf: "scarf" };

/** One end's saw setting: "miter 22 1/2°", or "square". */
function endSetting(end: End, angle: number): string {
  if (angle === 0 || end === "square") return "square";
  return `${END_WORD[end]} ${angleText(angle)}`;
}

/**
 * What a crew must know of a piece beyond its length, width and ends, one phrase each: the radius and
 * sweep of a curved piece, the saw setting at each angled end, an edge bevel, and a scarf-joint split.
 */
export function cutDetails(p: CutPiece): string[] {
  const out: string[] = [];
  if (p.radius !== undefined) {
    out.push(`R ${inchesText(p.radius)}${p.sweep !== undefined ? `, ${angleText(p.sweep)}` : ""}`);
    out.push(p.material === "casing" ? "length on the outer edge" : "length along the bent face");
  }
  if (p.cutAngles) {
    const [a, b] = [endSetting(p.ends[0], p.cutAngles[0]), endSetting(p.ends[1], p.cutAngles[1])];
    out.push(a === b ? `saw ${a}, both ends` : `saw ${a} / ${b}`);
  }
  if (p.edgeBevel !== undefined) out.push(`edge bevel ${angleText(p.edgeBevel)}`);
  if (p.scarf) out.push(`part ${p.scarf.part} of ${p.scarf.of}, ${inchesText(p.scarf.overlap)} scarf overlap`);
  return out;
}
