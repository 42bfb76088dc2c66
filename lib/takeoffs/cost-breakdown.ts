import { MATERIALS, type Material } from "@/takeoff";
import { textWidth } from "./elevation-callouts";
import { usd } from "./format";
import { MATERIAL_LABELS } from "./labels";
import type { TakeoffResult } from "@/takeoff";

export type SegmentKey = Material | "labour" | "markup" | "tax";

export interface Segment {
  key: SegmentKey;
  label: string;
  amount: number;
  /** Share of the bid total, 0–1. */
  share: number;
}

/**
 * Where the bid goes: material by kind (boards in the plan plus the waste allowance, as bought), then labour,
 * markup and tax. Parts that cost nothing are left out so the bar has no empty slivers.
 */
export function costBreakdown(result: TakeoffResult): Segment[] {
  const bought = new Map(result.materials.map((m) => [m.material, m.cost + m.allowanceCost]));
  const parts: Omit<Segment, "share">[] = [
    ...MATERIALS.map((m) => ({ key: m as SegmentKey, label: MATERIAL_LABELS[m], amount: bought.get(m) ?? 0 })),
    { key: "labour", label: "Labour", amount: result.bid.labour },
    { key: "markup", label: "Markup", amount: result.bid.markup },
    { key: "tax", label: "Tax", amount: result.bid.tax },
  ];
  const total = parts.reduce((t, p) => t + p.amount, 0);
  return parts.filter((p) => p.amount > 0).map((p) => ({ ...p, share: total > 0 ? p.amount / total : 0 }));
}

export interface PlacedSegment extends Segment {
  x: number;
  width: number;
  amountText: string;
  /** Wide enough for name and amount on two lines inside the segment. */
  inside: boolean;
  /** For a label outside: which side of the bar, its row counted out from the bar (0 nearest), its left edge. */
  side: "above" | "below";
  row: number;
  labelX: number;
}

interface Span {
  from: number;
  to: number;
}

/**
 * Segments along a bar `width` long. A segment wide enough carries its name and amount inside; a narrow
 * one gets them on one line outside, joined by a leader: below the bar first, then above, row by row
 * outward, on the first row where the label overlaps no other and its leader crosses no nearer label
 * (when no row allows that, the first free one).
 */
export function layoutBar(segments: Segment[], width: number, fontSize: number): PlacedSegment[] {
  const rows: Record<"above" | "below", Span[][]> = { above: [], below: [] };
  const pad = fontSize * 0.8;
  let x = 0;
  return segments.map((s) => {
    const w = s.share * width;
    const amountText = usd(s.amount);
    const inside = Math.max(textWidth(s.label, fontSize), textWidth(amountText, fontSize)) + fontSize <= w;
    const placed: PlacedSegment = { ...s, x, width: w, amountText, inside, side: "below", row: -1, labelX: 0 };
    x += w;
    if (inside) return placed;
    const tw = textWidth(`${s.label} ${amountText}`, fontSize);
    const mid = placed.x + w / 2;
    const labelX = Math.min(Math.max(mid - tw / 2, 0), width - tw);
    const free = (row: Span[] | undefined) => (row ?? []).every((sp) => labelX + tw + pad <= sp.from || labelX >= sp.to + pad);
    const leaderClear = (side: "above" | "below", r: number) => rows[side].slice(0, r).every((row) => row.every((sp) => mid < sp.from - 2 || mid > sp.to + 2));
    const depth = Math.max(rows.above.length, rows.below.length) + 1;
    const candidates = Array.from({ length: depth }, (_, r) => [["below", r] as const, ["above", r] as const]).flat();
    const fits = (c: readonly ["above" | "below", number]) => free(rows[c[0]][c[1]]);
    const [side, row] = candidates.find((c) => fits(c) && leaderClear(c[0], c[1])) ?? candidates.find(fits)!;
    (rows[side][row] ??= []).push({ from: labelX, to: labelX + tw });
    return { ...placed, side, row, labelX };
  });
}
