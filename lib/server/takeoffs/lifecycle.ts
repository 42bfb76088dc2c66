import { db } from "@/db/client";
import { isUniqueViolation } from "@/db/errors";
import type { ProjectScope } from "@/db/queries/project-scope";
import { lockProject } from "@/db/queries/projects";
import { deleteDraftTakeoff, findSubmittedName, markProjectSubmitted, markSubmitted, ONE_SUBMITTED_KEY, takeoffExists, updateDraftTakeoff } from "@/db/queries/takeoff-lifecycle";
import { insertTakeoff } from "@/db/queries/takeoffs";
import { AppError, conflict, notFound } from "@/lib/errors";
import { getTakeoff, MISSING_TAKEOFF } from "./takeoffs";

const locked = () => conflict("This takeoff was submitted as the bid and is locked. Make a copy to continue working on it.", undefined, "locked");
const alreadyBid = (name: string) =>
  conflict(`"${name}" is already this project's submitted bid; a project has one. Make a copy of it to revise the bid.`, undefined, "already_submitted");

/** Rename or re-note a draft. A submitted takeoff refuses every edit, whoever asks. */
export async function updateTakeoff(s: ProjectScope, id: string, input: { name?: string; note?: string | null }) {
  const current = await getTakeoff(s, id);
  if (current.status === "submitted") throw locked();
  if (!(await updateDraftTakeoff(s, id, input))) throw locked(); // submitted between the read and the write
  return getTakeoff(s, id);
}

export async function deleteTakeoff(s: ProjectScope, id: string) {
  const current = await getTakeoff(s, id);
  if (current.status === "submitted") throw locked();
  if (!(await deleteDraftTakeoff(s, id))) throw locked();
}

/**
 * Marks the takeoff as the submitted bid: it is locked from then on, and the project's status says
 * "submitted" (a project that was already won or lost keeps that status). One takeoff per project is
 * submitted: the project row is locked first so two submits queue, and the partial unique index
 * refuses a second one even if something else gets past that.
 */
export async function submitTakeoff(s: ProjectScope & { userId: string }, id: string) {
  const current = await getTakeoff(s, id);
  const placeholders = current.result.placeholders ?? [];
  if (current.status === "draft" && placeholders.length > 0) {
    // A placeholder price is a guess the price book never confirmed: it may not go out as the bid.
    throw new AppError(
      409,
      `This takeoff prices ${placeholders.length} item${placeholders.length === 1 ? "" : "s"} with a placeholder (${placeholders.map((p) => `${p.itemName.replace(/^PLACEHOLDER /, "")} for ${p.marks.join(", ")}`).join("; ")}). Add ${placeholders.length === 1 ? "it" : "them"} to the price book and run the takeoff again before submitting it.`,
      undefined,
      undefined,
      "placeholder_prices",
    );
  }
  try {
    await db.transaction(async (tx) => {
      if (!(await lockProject(s, tx))) throw notFound("No such project.");
      const other = await findSubmittedName(s, id, tx);
      if (other) throw alreadyBid(other);
      if (!(await markSubmitted(s, id, s.userId, tx))) {
        throw (await takeoffExists(s, id, tx)) ? conflict("This takeoff is already the submitted bid.", undefined, "already_submitted") : notFound(MISSING_TAKEOFF);
      }
      await markProjectSubmitted(s, tx);
    });
  } catch (error) {
    if (!isUniqueViolation(error, ONE_SUBMITTED_KEY)) throw error;
    throw alreadyBid((await findSubmittedName(s, null)) ?? "Another takeoff");
  }
  return getTakeoff(s, id);
}

/** A draft copy of any takeoff (submitted or not) with the same snapshots, to continue from. */
export async function copyTakeoff(s: ProjectScope & { userId: string }, id: string) {
  const source = await getTakeoff(s, id);
  const copyId = await insertTakeoff({
    orgId: s.orgId,
    projectId: s.projectId,
    name: `Copy of ${source.name}`.slice(0, 80),
    note: source.note,
    priceBookId: null,
    inputs: source.inputs,
    prices: source.prices,
    result: source.result,
    createdBy: s.userId,
  });
  return getTakeoff(s, copyId);
}
