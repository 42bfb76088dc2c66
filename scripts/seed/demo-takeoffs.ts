import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { priceBookItems, priceBooks, projects, takeoffs } from "@/db/schema";
import { runTakeoff } from "@/lib/server/takeoffs/run-takeoff";

/**
 * Two takeoffs of the demo project so the results and compare pages have something to show: the base
 * bid (each window's own casing, the cheaper stock where two match) and an alternate in poplar casing.
 */
export async function seedDemoTakeoffs(orgId: string, projectId: string | null, priceBookId: string, estimatorId: string) {
  const [project] = projectId ? await db.select({ id: projects.id }).from(projects).where(and(eq(projects.orgId, orgId), eq(projects.id, projectId))) : [];
  const [book] = await db.select({ id: priceBooks.id }).from(priceBooks).where(and(eq(priceBooks.orgId, orgId), eq(priceBooks.id, priceBookId)));
  if (!project || !book) return false;
  if ((await db.select({ id: takeoffs.id }).from(takeoffs).where(eq(takeoffs.projectId, project.id)).limit(1)).length > 0) return false;
  const scope = { orgId, projectId: project.id, userId: estimatorId };
  await runTakeoff(scope, { name: "Base bid", note: "Each window's own casing; finger-jointed pine where it is the cheaper stock.", priceBookId: book.id });
  const [poplar] = await db
    .select({ id: priceBookItems.id })
    .from(priceBookItems)
    .where(and(eq(priceBookItems.priceBookId, book.id), eq(priceBookItems.supplierCode, "DEMO-C250-PO")));
  if (poplar) await runTakeoff(scope, { name: "Alternate — poplar casing", note: "Stain-grade poplar casing on every window.", priceBookId: book.id, casingItemId: poplar.id });
  return true;
}
