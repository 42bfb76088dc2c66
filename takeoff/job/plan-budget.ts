/**
 * The run-wide planning budget: one takeoff run may spend `planSeconds` of wall-clock time planning all
 * of its board orders. Each planStock call gets a fair share of what is left, weighted by the pieces it
 * plans: share = remaining × weight / (weight of every call still to come, this one included). A call
 * that finishes early (most plans are proven optimal in milliseconds) leaves its time to the rest, and
 * one that overruns is taken from the rest, so the run as a whole keeps to the deadline.
 */

/** Seconds a run may spend planning when its settings give none. */
export const DEFAULT_RUN_PLAN_SECONDS = 2;

/**
 * No call gets less than this, so a run whose deadline has passed still asks each planner for a plan
 * (its quickest, best found so far) rather than for none: a budget of 0 could read as "no budget".
 */
const MIN_SHARE_MS = 1;

export class PlanBudget {
  private readonly deadline: number;
  private pending = 0;

  /** `now` is a millisecond clock; tests pass their own. */
  constructor(
    readonly seconds: number,
    private readonly now: () => number = () => performance.now(),
  ) {
    this.deadline = now() + seconds * 1000;
  }

  /** Announces calls still to come (their total weight), so earlier calls leave them their share. */
  expect(weight: number): void {
    this.pending += weight;
  }

  /**
   * Milliseconds for the next call, of `weight` pieces. A call not announced beforehand (the rip step,
   * whose size is known only once the strips are planned) is counted in as it comes.
   */
  share(weight: number, announced = true): number {
    if (!announced) this.pending += weight;
    const pool = Math.max(this.pending, weight);
    this.pending = Math.max(0, this.pending - weight);
    const remaining = Math.max(0, this.deadline - this.now());
    const ms = pool > 0 ? (remaining * weight) / pool : remaining;
    return Math.max(MIN_SHARE_MS, Math.floor(ms));
  }
}

/** planSeconds as given, or the default when absent; a value that is no duration is read as the default too. */
export function runPlanSeconds(planSeconds: number | undefined): number {
  return planSeconds !== undefined && Number.isFinite(planSeconds) && planSeconds >= 0 ? planSeconds : DEFAULT_RUN_PLAN_SECONDS;
}

/** How the run's planning went, from its orders' proof states (TakeoffResult.planning). */
export function planningSummary(
  orders: readonly { plan: { proof?: "optimal" | "best-found"; budgetSpent?: boolean } }[],
  budgetSeconds: number,
): { budgetSeconds: number; allOptimal: boolean; bestFound: number; budgetSpent: number } {
  const bestFound = orders.filter((o) => o.plan.proof !== "optimal").length;
  return { budgetSeconds, allOptimal: bestFound === 0, bestFound, budgetSpent: orders.filter((o) => o.plan.budgetSpent === true).length };
}
