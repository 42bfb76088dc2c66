import type { SheetView } from "./api-types";

/**
 * Sheet numbers in the order a plan set's index reads them: A-2 before before A-110, case ignored.
 * Intl's numeric collation compares each run of digits as a number.
 */
const collator = new Intl.Collator("en", { numeric: true, sensitivity: "base" });

export const compareSheetNumbers = (a: string, b: string) => collator.compare(a.trim(), b.trim());

/**
 * Plan sets stay in the order the server gives them (oldest upload first); inside a set, sheets go by sheet
 * number, then page. The Plans page and the viewer's previous/next both use this order.
 */
export function orderSheets<S extends Pick<SheetView, "planSetId" | "label" | "pageNumber">>(sheets: readonly S[]): S[] {
  const setRank = new Map<string, number>();
  for (const s of sheets) if (!setRank.has(s.planSetId)) setRank.set(s.planSetId, setRank.size);
  return [...sheets].sort(
    (a, b) => setRank.get(a.planSetId)! - setRank.get(b.planSetId)! || compareSheetNumbers(a.label, b.label) || a.pageNumber - b.pageNumber,
  );
}

/** The sheets either side of one, in that order; null at the ends (no wrap-around: the ends should feel like ends). */
export function neighbours<S extends { id: string }>(ordered: readonly S[], id: string): { previous: S | null; next: S | null } {
  const i = ordered.findIndex((s) => s.id === id);
  if (i < 0) return { previous: null, next: null };
  return { previous: ordered[i - 1] ?? null, next: ordered[i + 1] ?? null };
}
