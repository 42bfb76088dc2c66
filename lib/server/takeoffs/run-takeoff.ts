import { findResultByInputHash, insertTakeoff } from "@/db/queries/takeoffs";
import type { ProjectScope } from "@/db/queries/project-scope";
import { AppError, invalid } from "@/lib/errors";
import { requireProject } from "@/lib/server/projects/require-project";
import { computeTakeoff, MissingItem, OpeningTypeProblem, PriceGaps } from "@/takeoff";
import type { TakeoffInputs, TakeoffPrices, TakeoffResult } from "@/takeoff";
import type { RunTakeoffInput } from "@/lib/validators/takeoff";
import { takeoffInputHash } from "./input-hash";
import { snapshotInputs, snapshotPrices } from "./snapshot";
import { keepSnapshotText, snapshotMembers } from "./snapshot-text";

/** The engine's refusals as the estimator's to fix (422 naming the field), not server faults. */
async function compute(inputs: TakeoffInputs, prices: TakeoffPrices): Promise<TakeoffResult> {
  try {
    return await computeTakeoff(inputs, prices);
  } catch (error) {
    if (error instanceof OpeningTypeProblem) throw invalid({ [`openingTypes.${error.mark}.${error.field}`]: error.message }, error.message);
    if (error instanceof PriceGaps) {
      const gaps = error.gaps.map(({ mark, material, kind, message, fix }) => ({ mark, material, kind, message, fix }));
      throw new AppError(422, error.message, { priceBookId: error.message }, { gaps }, "price_gaps");
    }
    if (error instanceof MissingItem) throw invalid({ priceBookId: error.message }, error.message);
    throw error;
  }
}

/**
 * Runs and saves a takeoff: snapshots of the window list, counts and prices as they are now, then the
 * engine. When this organisation already computed a takeoff from exactly these snapshots (same input
 * hash), its result is reused instead of solving again: the engine is pure, so the answer is the same.
 * Returns the new takeoff's id.
 */
export async function runTakeoff(s: ProjectScope & { userId: string }, input: RunTakeoffInput) {
  await requireProject(s);
  const [prices, inputs] = await Promise.all([
    snapshotPrices(s.orgId, input.priceBookId),
    snapshotInputs(s, input.casingItemId ?? null, input.allowPlaceholders ?? false),
  ]);
  if (inputs.openingTypes.length === 0) throw invalid({ _: "The window list is empty: add opening types and tag them first." });
  const inputHash = takeoffInputHash(inputs, prices);
  const result = (await findResultByInputHash(s.orgId, inputHash)) ?? (await compute(inputs, prices));
  const id = await insertTakeoff({
    orgId: s.orgId,
    projectId: s.projectId,
    name: input.name,
    note: input.note ?? null,
    priceBookId: input.priceBookId,
    inputs,
    prices,
    result,
    inputHash,
    createdBy: s.userId,
  });
  // The route answers with this takeoff next: its snapshots' text is made now, from what is in hand.
  keepSnapshotText(s, id, snapshotMembers({ inputs, prices, result }));
  return id;
}
