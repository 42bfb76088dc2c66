import Link from "next/link";
import { usd } from "@/lib/takeoffs/format";
import { proofSummary, type PlanProofText } from "@/lib/takeoffs/plan-proof";
import type { BoardOrder } from "@/takeoff";

/**
 * Above the board orders when any plan is the best found rather than proven cheapest: how many, how much
 * they may be over at most, and — when the clock stopped the search — where the time limit is set.
 * Nothing for takeoffs whose orders were all proven, or saved before proofs were recorded.
 */
export function PlanProofNotice({ orders, settingsHref, planSeconds }: { orders: readonly BoardOrder[]; settingsHref?: string; planSeconds?: number }) {
  const s = proofSummary(orders);
  if (!s) return null;
  const limit = planSeconds === undefined ? "the board-order time limit" : `the board-order time limit (${planSeconds} s for this run)`;
  return (
    <p role="note" aria-label="Board-order proof" className="rounded-md border border-brass-400 bg-maple-100 px-3 py-2 text-sm text-graphite-900">
      {s.bestFound === s.total ? (s.total === 1 ? "The board order is" : `All ${s.total} board orders are`) : `${s.bestFound} of ${s.total} board orders are`} the best
      found, not proven cheapest: {s.bestFound === 1 ? "it costs" : "together they cost"} at most {usd(s.over)} more than the proven{" "}
      {s.bestFound === 1 ? "bound" : "bounds"} given beside {s.bestFound === 1 ? "it" : "them"}.{" "}
      {s.budgetSpent && (
        <>
          The search stopped at {limit}; on large jobs a longer limit can find cheaper orders. Set it under{" "}
          {settingsHref ? (
            <Link href={settingsHref} className="font-medium text-spruce-700 underline">
              Settings → Board-order time limit
            </Link>
          ) : (
            "Settings → Board-order time limit"
          )}{" "}
          and run the takeoff again.
        </>
      )}
    </p>
  );
}

/** One order's proof state under its name: a short mark when proven, the label and the bound when not. */
export function PlanProofLine({ text }: { text: PlanProofText | null }) {
  if (!text) return null;
  if (text.proof === "optimal") {
    return (
      <span className="block text-xs font-medium text-spruce-700" title={text.detail}>
        ✓ {text.label}
      </span>
    );
  }
  return (
    <span className="block text-xs font-normal text-graphite-700">
      <span className="font-semibold text-brass-700">{text.label}.</span> {text.detail}
    </span>
  );
}
