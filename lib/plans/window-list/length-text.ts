import { formatLength, formatLengthExact } from "@/takeoff";
import { lengthInput } from "@/lib/validators/length";

/**
 * Lengths of two feet and more read best in feet-inches, the way a window schedule writes them
 * (2'-1 7/8", 3'-0"); anything shorter — setbacks, casing, reveals — reads best in plain inches.
 */
export const FEET_INCHES_FROM = 24;

/**
 * A length as the tape reads it, to the nearest 1/16 — except a short one set on a finer mark (a 3/32"
 * reveal), which shows its exact fraction to the 1/64, so what the list shows is what the takeoff uses.
 */
export function tape(inches: number): string {
  // Decided on the value as shown: 23 31/32 rounds (half up) to 24", so it reads 2'-0".
  const feet = Math.abs(inches) >= FEET_INCHES_FROM - 1 / 32;
  if (!feet && Number.isInteger(inches * 64)) return formatLengthExact(inches);
  return formatLength(inches, { style: feet ? "feet-inches" : "inches" });
}

export type LengthRead = { ok: true; inches: number } | { ok: false; message: string };

/**
 * Reads a length the way the API will (the shared validator, so `25 7/8`, `2'-1 7/8"` and `635 mm`
 * all mean the same thing in the browser and on the server).
 */
export function readLength(text: string, label: string, opts: { allowZero?: boolean } = {}): LengthRead {
  const parsed = lengthInput(label, opts).safeParse(text.trim());
  if (parsed.success) return { ok: true, inches: parsed.data };
  return { ok: false, message: parsed.error.issues[0]?.message ?? `${label}: not a length.` };
}

/** "2 1/2 x 11/16", "2-1/2\" × 11/16\"", "2.5 by .6875": casing face width and thickness. */
export function splitCasing(text: string): [string, string] | null {
  // No way of writing a length uses "x" or "by", so they can only be the separator.
  const parts = text.split(/\s*(?:×|x|\*|by)\s*/i).filter((p) => p.trim() !== "");
  if (parts.length !== 2) return null;
  return [parts[0]!.trim(), parts[1]!.trim()];
}
