import type { ArchSegments } from "../types";
import { degrees, sixteenth } from "./piece";

const SLACK = 1e-9;

/**
 * A casing ring (inner radius Ri, outer Ro, sweeping `sweep` degrees) cut as equal flat segments from
 * boards `boardWidth` wide (derived geometry). A segment of angle φ sits in its blank with the outer
 * chord on one edge of the board: it is 2·Ro·sin(φ/2) long and Ro − Ri·cos(φ/2) deep (from the middle of
 * the outer arc to the chord through the inner corners), and each end is cut radially, φ/2 from square.
 * The fewest segments whose depth fits the board; φ/2 never passes 90°.
 */
export function archSegments(innerRadius: number, outerRadius: number, sweep: number, boardWidth: number): Omit<ArchSegments, "blanks"> {
  if (!(boardWidth > outerRadius - innerRadius)) throw new Error("segmentBoardWidth: segment board width must be more than the casing width");
  const depth = (n: number) => outerRadius - innerRadius * Math.cos(((sweep / n / 2) * Math.PI) / 180);
  const ratio = (outerRadius - boardWidth) / innerRadius;
  const maxHalf = ratio <= 0 ? 90 : (Math.acos(ratio) * 180) / Math.PI;
  let count = Math.max(1, Math.ceil(sweep / 180 - SLACK), Math.ceil(sweep / (2 * maxHalf) - SLACK));
  while (count > 1 && depth(count - 1) <= boardWidth + SLACK && sweep / (count - 1) <= 180) count--;
  while (depth(count) > boardWidth + SLACK) count++;
  const half = ((sweep / count / 2) * Math.PI) / 180;
  return { boardWidth, count, blankLength: sixteenth(2 * outerRadius * Math.sin(half)), endCut: degrees(half) };
}
