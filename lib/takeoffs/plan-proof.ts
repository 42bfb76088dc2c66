import type { BoardOrder, PriceItemSnapshot } from "@/takeoff";
import { count, usd } from "./format";

/** What the results page says about how good one board order's plan is; null for rows saved before proofs. */
export interface PlanProofText {
  proof: "optimal" | "best-found";
  /** "Optimal — proven", "Best found within the time limit", or "Best found — not proven optimal". */
  label: string;
  /** The proven bound and how far the plan may be above it, in words. */
  detail: string;
}

// Money bounds are shown so that the sentence stays true after rounding to the cent: a lower bound is
// rounded down, a most-over figure up (derived). Sums of cent prices carry float noise, hence the nudge.
const centsDown = (x: number) => Math.floor(x * 100 + 1e-6) / 100;
const centsUp = (x: number) => Math.ceil(x * 100 - 1e-6) / 100;

/**
 * Fewest boards any plan can buy, from the proven length bound: every board is at most the longest stock
 * length the item comes in, so n boards hold at most n × longest (derived). Only for orders crosscut from
 * whole boards: in a ripped order the length bound counts strips, which do not turn into boards exactly.
 */
export function fewestBoards(order: BoardOrder, items: readonly PriceItemSnapshot[] | undefined): number | null {
  if (order.rip || !items) return null;
  const lengths = items.find((i) => i.id === order.itemId)?.stock.map((s) => s.length) ?? [];
  if (lengths.length === 0) return null;
  const longest = Math.max(...lengths);
  if (!(longest > 0) || !(order.plan.lowerBound.length > 0)) return null;
  // Lengths are sixteenths and stock whole inches, so the quotient is exact up to float noise.
  return Math.ceil(order.plan.lowerBound.length / longest - 1e-9);
}

/** The plan's proof state in words, with its bound: "no cutting plan can use fewer than 14 boards, and none can cost less than $245.25". */
export function planProofText(order: BoardOrder, items?: readonly PriceItemSnapshot[]): PlanProofText | null {
  const { proof, budgetSpent, lowerBound, cost } = order.plan;
  if (!proof) return null;
  if (proof === "optimal") {
    return { proof, label: "Optimal — proven", detail: "No cutting plan for these pieces costs less (before the waste allowance)." };
  }
  const boards = fewestBoards(order, items);
  const bound =
    boards !== null
      ? `no cutting plan can use fewer than ${count(boards)} ${boards === 1 ? "board" : "boards"}, and none can cost less than ${usd(centsDown(lowerBound.cost))}`
      : `no cutting plan can cost less than ${usd(centsDown(lowerBound.cost))}`;
  const over = centsUp(Math.max(0, cost - lowerBound.cost));
  return {
    proof,
    label: budgetSpent ? "Best found within the time limit" : "Best found — not proven optimal",
    detail: `Proven: ${bound} (before the waste allowance), so this plan costs at most ${usd(over)} more than the cheapest.`,
  };
}

/** The line above the board orders when any was not proven cheapest; null when all are (or rows predate proofs). */
export function proofSummary(orders: readonly BoardOrder[]): { bestFound: number; total: number; budgetSpent: boolean; over: number } | null {
  const best = orders.filter((o) => o.plan.proof === "best-found");
  if (best.length === 0) return null;
  return {
    bestFound: best.length,
    total: orders.length,
    budgetSpent: best.some((o) => o.plan.budgetSpent),
    over: centsUp(best.reduce((t, o) => t + Math.max(0, o.plan.cost - o.plan.lowerBound.cost), 0)),
  };
}
