/**
 * A wall-clock deadline shared by every step of one planning call. Steps poll
 * it between units of work (a simplex solve, a knapsack, a dive), so a call
 * may overrun its budget by about one such unit; HiGHS gets the remaining
 * time as its own time limit. `spent` records that some step was cut short,
 * which the plan reports as `budgetSpent`.
 */
export class Deadline {
  private readonly end: number;
  spent = false;

  constructor(budgetMs: number) {
    this.end = performance.now() + budgetMs;
  }

  /** Milliseconds left (never negative). */
  remainingMs(): number {
    return Math.max(0, this.end - performance.now());
  }

  /** True once the budget is over; marks it spent, since the caller now stops early. */
  expired(): boolean {
    if (performance.now() < this.end) return false;
    this.spent = true;
    return true;
  }
}

/** A deadline that never ends: for internal callers and tests that must not depend on timing. */
export const NO_DEADLINE = new Deadline(Number.POSITIVE_INFINITY);
