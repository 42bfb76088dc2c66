import { exact, Fraction } from "./exact";
import { trimSpecSchema, windowOpeningSchema } from "./schemas";
import type { Style, TrimSpec, WindowOpening } from "./types";
import { parseOrThrow } from "./validate";

/** Reveal 1/8 in: within the 1/16–1/8 in reveal finish carpenters leave (common practice). */
export const DEFAULT_REVEAL = new Fraction(1, 8);

/**
 * Stool nose 1 in beyond the finished wall face: enough to stand proud of
 * casing of 11/16–3/4 in so the casing legs die onto the stool (common practice).
 */
export const DEFAULT_STOOL_PROJECTION = new Fraction(1);

/**
 * Extension stock 3/4 in thick: 1-in nominal boards dress to 3/4 in (PS 20,
 * American Softwood Lumber Standard, dry dressed sizes).
 */
export const DEFAULT_EXTENSION_THICKNESS = new Fraction(3, 4);

/** Horn = 2 × casing thickness (common practice), so the stool ends clear the casing. */
export const HORN_PER_CASING_THICKNESS = 2;

/** The defaults above as plain numbers, for forms and documentation. */
export const TRIM_DEFAULTS = {
  reveal: DEFAULT_REVEAL.valueOf(),
  stoolProjection: DEFAULT_STOOL_PROJECTION.valueOf(),
  extensionThickness: DEFAULT_EXTENSION_THICKNESS.valueOf(),
  hornPerCasingThickness: HORN_PER_CASING_THICKNESS,
  apronInset: 0,
  apronReturns: true,
} as const;

export interface ResolvedSpec {
  style: Style;
  casingWidth: Fraction;
  casingThickness: Fraction;
  reveal: Fraction;
  stoolHorn: Fraction;
  stoolProjection: Fraction;
  apronInset: Fraction;
  apronReturns: boolean;
  extensionThickness: Fraction;
}

export interface ResolvedOpening {
  width: Fraction;
  height: Fraction;
  setback: Fraction;
}

/** Validates a trim spec (Error names the field) and fills defaults, all as exact fractions. */
export function resolveSpec(spec: TrimSpec): ResolvedSpec {
  const s = parseOrThrow(trimSpecSchema, spec);
  const casingThickness = exact(s.casingThickness);
  const casingWidth = exact(s.casingWidth);
  if (s.reveal === undefined && DEFAULT_REVEAL.gte(casingWidth)) {
    throw new Error("reveal: the default 1/8 in reveal must be less than the casing width");
  }
  return {
    style: s.style,
    casingWidth,
    casingThickness,
    reveal: s.reveal === undefined ? DEFAULT_REVEAL : exact(s.reveal),
    stoolHorn: s.stoolHorn === undefined ? casingThickness.mul(HORN_PER_CASING_THICKNESS) : exact(s.stoolHorn),
    stoolProjection: s.stoolProjection === undefined ? DEFAULT_STOOL_PROJECTION : exact(s.stoolProjection),
    apronInset: s.apronInset === undefined ? new Fraction(0) : exact(s.apronInset),
    apronReturns: s.apronReturns ?? true,
    extensionThickness:
      s.extensionThickness === undefined ? DEFAULT_EXTENSION_THICKNESS : exact(s.extensionThickness),
  };
}

export function resolveOpening(opening: WindowOpening): ResolvedOpening {
  const o = parseOrThrow(windowOpeningSchema, opening);
  return { width: exact(o.width), height: exact(o.height), setback: exact(o.setback) };
}
