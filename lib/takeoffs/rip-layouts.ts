import type { BoardOrder, RipLayout } from "@/takeoff";
import { count, inchesText, stockLength, tapeLength } from "./format";

/** The crosscuts made along the strips of one width ripped from boards of one length. */
export interface StripCutGroup {
  /** Strip width; null only when neither the pattern nor the order says (not written by the engine). */
  width: number | null;
  stockLength: number;
  /** Strips of this width and length the layouts yield. */
  strips: number;
  /** Patterns cut along them, as the plan gives them (cuts longest first); count = strips cut so. */
  patterns: { count: number; cuts: number[]; offcut: number }[];
  /** Strips ripped but not cut into pieces: they are offcut. */
  spare: number;
}

// Widths come out of the same engine run, so equal widths are equal numbers; the key only absorbs float noise.
const key = (w: number | null) => (w === null ? "none" : String(Math.round(w * 1e6)));

/** A ripped order whose boards are laid out as strips of several widths (saved after mixed widths shared boards). */
export const ripLayoutsOf = (o: BoardOrder): RipLayout[] => o.rip?.layouts ?? [];

/** The strip widths an order is ripped to, in words: 1 1/2", 3/4" (several) or 1 7/16" (one); null when not ripped. */
export function ripWidthsText(o: BoardOrder): string | null {
  if (o.widths && o.widths.length > 0) return o.widths.map(inchesText).join(", ");
  return o.width === undefined ? null : inchesText(o.width);
}

/** 1 1/2" + 3/4" + 3/4": every strip of one board, widest first, as the fence is set for each rip. */
export const stripsText = (strips: readonly number[]) => strips.map(inchesText).join(" + ");

/** What is left of the board's width after the strips and rip kerfs, never a negative float remainder. */
export function leftText(offcutWidth: number): string {
  if (offcutWidth <= 1e-9) return "nothing left";
  const text = inchesText(offcutWidth);
  return text === '0"' ? 'under 1/32" left' : `${text} left`;
}

/** "12 × 16' boards, each ripped to 1 1/2" + 3/4" + 3/4" (1/4" left)". */
export function layoutText(l: RipLayout): string {
  const boards = l.count === 1 ? `1 × ${stockLength(l.stockLength)} board, ripped to` : `${count(l.count)} × ${stockLength(l.stockLength)} boards, each ripped to`;
  return `${boards} ${stripsText(l.strips)} (${leftText(l.offcutWidth)})`;
}

/** Cuts along one strip or board, longest first, repeats counted: 2 × 5'-0 3/4" + 3'-0". */
export function cutsText(cuts: readonly number[]): string {
  const runs: { length: number; n: number }[] = [];
  for (const c of cuts) {
    const last = runs[runs.length - 1];
    if (last && Math.abs(last.length - c) < 1e-9) last.n += 1;
    else runs.push({ length: c, n: 1 });
  }
  return runs.map((r) => (r.n === 1 ? tapeLength(r.length) : `${r.n} × ${tapeLength(r.length)}`)).join(" + ");
}

/**
 * Per strip width (widest first) and stock length (longest first): the strips the layouts yield and the
 * crosscut patterns the plan makes along them (BoardPattern.width), with the strips left over. Empty for
 * orders without layouts, which render as they always did.
 */
export function stripCutGroups(o: BoardOrder): StripCutGroup[] {
  const layouts = ripLayoutsOf(o);
  if (layouts.length === 0) return [];
  const groups = new Map<string, StripCutGroup>();
  const groupOf = (width: number | null, length: number) => {
    const k = `${key(width)}|${length}`;
    let g = groups.get(k);
    if (!g) groups.set(k, (g = { width, stockLength: length, strips: 0, patterns: [], spare: 0 }));
    return g;
  };
  for (const l of layouts) for (const w of l.strips) groupOf(w, l.stockLength).strips += l.count;
  for (const p of o.plan.boards) groupOf(p.width ?? o.width ?? null, p.stockLength).patterns.push({ count: p.count, cuts: p.cuts, offcut: p.offcut });
  const out = [...groups.values()];
  for (const g of out) g.spare = Math.max(0, g.strips - g.patterns.reduce((t, p) => t + p.count, 0));
  return out.sort((a, b) => (b.width ?? 0) - (a.width ?? 0) || b.stockLength - a.stockLength);
}

/** "1 1/2" strips from 16' boards". */
export const stripGroupTitle = (g: StripCutGroup) => `${g.width === null ? "Strips" : `${inchesText(g.width)} strips`} from ${stockLength(g.stockLength)} boards`;

/** "10 strips: 2 × 5'-0 3/4" (1'-10 1/4" offcut)". */
export const patternText = (p: StripCutGroup["patterns"][number]) =>
  `${count(p.count)} ${p.count === 1 ? "strip" : "strips"}: ${cutsText(p.cuts)} (${tapeLength(Math.max(0, p.offcut))} offcut)`;
