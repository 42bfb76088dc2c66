import type { Opening, TrimSpec } from "./types";

/** Every field of every opening kind; a kind's absent fields read as undefined and so never collide. */
const OPENING_FIELDS = ["kind", "width", "height", "setback", "widths", "mullGap", "sides", "springHeight", "rise", "turn", "seat"] as const;
const SPEC_FIELDS = [
  "style",
  "casingWidth",
  "casingThickness",
  "reveal",
  "stoolHorn",
  "stoolProjection",
  "apronInset",
  "apronReturns",
  "extensionThickness",
  "curvedCasing",
  "segmentBoardWidth",
] as const;

/** Numbers as themselves; lists element by element; anything else tagged with its type (numbers never contain ":"). */
function part(v: unknown): string {
  if (typeof v === "number") return String(v);
  if (Array.isArray(v)) return `[${v.map(part).join(",")}]`;
  return `${typeof v}:${String(v)}`;
}

/**
 * Identity of an opening+spec for reuse of its cut list: every field that
 * shapes the result, typed, so 2.5 and "2.5", or NaN and an omitted field,
 * never share a key. Undefined for inputs that are not plain objects.
 */
export function openingSpecKey(opening: Opening, spec: TrimSpec): string | undefined {
  if (typeof opening !== "object" || opening === null || typeof spec !== "object" || spec === null) return undefined;
  const o = opening as unknown as Record<string, unknown>;
  const s = spec as unknown as Record<string, unknown>;
  let key = "";
  for (const f of OPENING_FIELDS) key += `${part(o[f])}|`;
  for (const f of SPEC_FIELDS) key += `${part(s[f])}|`;
  return key;
}
