import { and, eq, ne } from "drizzle-orm";
import { db, type Tx } from "../client";
import { isUniqueViolation } from "../errors";
import { projects, takeoffs } from "../schema";
import { AppError, conflict, notFound } from "@/lib/errors";
import { lockProject } from "./projects";
import { getTakeoff } from "./takeoffs";
import type { ProjectScope } from "./project-scope";

const scoped = (s: ProjectScope, id: string) =>
  and(eq(takeoffs.orgId, s.orgId), eq(takeoffs.projectId, s.projectId), eq(takeoffs.id, id));

const locked = () => conflict("This takeoff was submitted as the bid and is locked. Make a copy to continue working on it.", undefined, "locked");

/** Rename or re-note a draft. A submitted takeoff refuses every edit, whoever asks. */
export async function updateTakeoff(s: ProjectScope, id: string, input: { name?: string; note?: string | null }) {
  const current = await getTakeoff(s, id);
  if (current.status === "submitted") throw locked();
  const rows = await db
    .update(takeoffs)
    .set(input)
    .where(and(scoped(s, id), eq(takeoffs.status, "draft")))
    .returning({ id: takeoffs.id });
  if (rows.length === 0) throw locked(); // submitted between the read and the write
  return getTakeoff(s, id);
}

export async function deleteTakeoff(s: ProjectScope, id: string) {
  const current = await getTakeoff(s, id);
  if (current.status === "submitted") throw locked();
  const rows = await db.delete(takeoffs).where(and(scoped(s, id), eq(takeoffs.status, "draft"))).returning({ id: takeoffs.id });
  if (rows.length === 0) throw locked();
}

const ONE_SUBMITTED = "takeoffs_one_submitted_per_project";
const alreadyBid = (name: string) =>
  conflict(`"${name}" is already this project's submitted bid; a project has one. Make a copy of it to revise the bid.`, undefined, "already_submitted");

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
      await lockProject(s, tx);
      const [other] = await tx
        .select({ name: takeoffs.name })
        .from(takeoffs)
        .where(and(eq(takeoffs.orgId, s.orgId), eq(takeoffs.projectId, s.projectId), eq(takeoffs.status, "submitted"), ne(takeoffs.id, id)))
        .limit(1);
      if (other) throw alreadyBid(other.name);
      await markSubmitted(s, id, tx);
    });
  } catch (error) {
    if (!isUniqueViolation(error, ONE_SUBMITTED)) throw error;
    const [other] = await db.select({ name: takeoffs.name }).from(takeoffs).where(and(eq(takeoffs.orgId, s.orgId), eq(takeoffs.projectId, s.projectId), eq(takeoffs.status, "submitted")));
    throw alreadyBid(other?.name ?? "Another takeoff");
  }
  return getTakeoff(s, id);
}

async function markSubmitted(s: ProjectScope & { userId: string }, id: string, tx: Tx) {
  const rows = await tx
    .update(takeoffs)
    .set({ status: "submitted", submittedAt: new Date(), submittedBy: s.userId })
    .where(and(scoped(s, id), eq(takeoffs.status, "draft")))
    .returning({ id: takeoffs.id });
  if (rows.length === 0) {
    const [exists] = await tx.select({ id: takeoffs.id }).from(takeoffs).where(scoped(s, id));
    throw exists ? conflict("This takeoff is already the submitted bid.") : notFound("No such takeoff.");
  }
  await tx
    .update(projects)
    .set({ status: "submitted", updatedAt: new Date() })
    .where(and(eq(projects.orgId, s.orgId), eq(projects.id, s.projectId), eq(projects.status, "draft")));
}

/** A draft copy of any takeoff (submitted or not) with the same snapshots, to continue from. */
export async function copyTakeoff(s: ProjectScope & { userId: string }, id: string) {
  const source = await getTakeoff(s, id);
  const [row] = await db
    .insert(takeoffs)
    .values({
      orgId: s.orgId,
      projectId: s.projectId,
      name: `Copy of ${source.name}`.slice(0, 80),
      note: source.note,
      priceBookId: null,
      inputs: source.inputs,
      prices: source.prices,
      result: source.result,
      createdBy: s.userId,
    })
    .returning({ id: takeoffs.id });
  return getTakeoff(s, row!.id);
}
