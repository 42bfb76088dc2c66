import type { OpeningKindName, OpeningShape } from "@/takeoff";
import { invalid } from "@/lib/errors";

/** What was typed: the kind, the overall size where the kind has one, and the kind's own fields. */
export type KindValues = Omit<OpeningShape, "seat"> & { kind?: OpeningKindName; width?: number; height?: number };

/**
 * An opening type's stored kind, shape and overall size from what was typed. The overall width of a
 * mulled unit or bay is the span Σwidths + (n−1)·mullGap; a round-top's height is springHeight + width/2,
 * a segment head's springHeight + rise (derived): what the openings list shows and the width check uses.
 * Fields of another kind are refused rather than silently kept.
 */
export function kindShape(v: KindValues): { kind: OpeningKindName; shape: OpeningShape | null; width: number; height: number } {
  const kind = v.kind ?? "window";
  const own: Record<OpeningKindName, (keyof KindValues)[]> = {
    window: [],
    mulled: ["widths", "mullGap"],
    bay: ["widths", "mullGap", "turn"],
    door: ["sides"],
    "round-top": ["springHeight"],
    "segment-top": ["springHeight", "rise"],
  };
  const foreign = (["widths", "mullGap", "sides", "springHeight", "rise", "turn"] as const).filter((k) => v[k] !== undefined && !own[kind].includes(k));
  if (foreign.length > 0) throw invalid(Object.fromEntries(foreign.map((k) => [k, `A ${kind} has no ${k}.`])));
  const span = (widths: number[], gap: number) => widths.reduce((t, w) => t + w, 0) + (widths.length - 1) * gap;
  switch (kind) {
    case "window":
      return { kind, shape: null, width: v.width!, height: v.height! };
    case "mulled":
      return { kind, shape: { widths: v.widths!, mullGap: v.mullGap! }, width: span(v.widths!, v.mullGap!), height: v.height! };
    case "bay":
      return { kind, shape: { widths: v.widths!, mullGap: v.mullGap!, turn: v.turn! }, width: span(v.widths!, v.mullGap!), height: v.height! };
    case "door":
      return { kind, shape: { sides: v.sides! }, width: v.width!, height: v.height! };
    case "round-top":
      return { kind, shape: { springHeight: v.springHeight! }, width: v.width!, height: v.springHeight! + v.width! / 2 };
    case "segment-top":
      return { kind, shape: { springHeight: v.springHeight!, rise: v.rise! }, width: v.width!, height: v.springHeight! + v.rise! };
  }
}
