import { formatLength, formatLengthExact } from "@/takeoff";

/**
 * Lengths as a price book writes them. A length on a 1/16 is written the way a tape reads it; a finer one
 * exactly (3/32", or decimal inches when it is off the 1/64 grid), so that export → import and an
 * untouched edit give back the number stored instead of rounding it to the nearest 1/16 on the way.
 */
const onSixteenth = (inches: number) => Number.isInteger(inches * 16);

/** A profile's face width or thickness: 2 1/2", 11/16", 5 1/4". */
export function sizeText(inches: number): string {
  return formatLengthExact(inches);
}

/** A stock length: 8', 10', or 8'-6" when it is not whole feet. */
export function stockLengthText(inches: number): string {
  if (Number.isInteger(inches) && inches % 12 === 0) return `${inches / 12}'`;
  return onSixteenth(inches) ? formatLength(inches, { style: "feet-inches" }) : formatLengthExact(inches);
}

/** Two lengths the shop would call the same: closer than a thousandth of an inch. */
export const sameLength = (a: number, b: number) => Math.abs(a - b) < 0.001;
