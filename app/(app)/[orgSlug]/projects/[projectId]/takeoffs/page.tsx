import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { priceBookItems, priceBooks } from "@/db/schema";
import { requireOrg } from "@/lib/auth/page-context";
import type { CasingChoice, PriceBookChoice } from "@/components/takeoffs/run-takeoff-form";
import { TakeoffsView } from "./takeoffs-client";
import { isUuid } from "@/lib/ids";

export const metadata: Metadata = { title: "Takeoffs" };


/** The books and casings the run form offers: names and sizes only, never prices. */
async function runChoices(orgId: string): Promise<{ priceBooks: PriceBookChoice[]; casings: CasingChoice[] }> {
  const [books, casings] = await Promise.all([
    db.select({ id: priceBooks.id, name: priceBooks.name }).from(priceBooks).where(eq(priceBooks.orgId, orgId)).orderBy(asc(priceBooks.name)),
    db
      .select({
        id: priceBookItems.id,
        priceBookId: priceBookItems.priceBookId,
        name: priceBookItems.name,
        faceWidth: priceBookItems.faceWidth,
        thickness: priceBookItems.thickness,
        species: priceBookItems.species,
      })
      .from(priceBookItems)
      .where(and(eq(priceBookItems.orgId, orgId), eq(priceBookItems.kind, "casing")))
      .orderBy(asc(priceBookItems.faceWidth), asc(priceBookItems.name)),
  ]);
  return { priceBooks: books, casings };
}

// The project layout has already checked that the project belongs to this organisation.
export default async function TakeoffsPage({ params }: { params: Promise<{ orgSlug: string; projectId: string }> }) {
  const { orgSlug, projectId } = await params;
  const { org, can } = await requireOrg(orgSlug);
  if (!isUuid(projectId)) notFound();
  const canRun = can("takeoff.run");
  const choices = canRun ? await runChoices(org.orgId) : { priceBooks: [], casings: [] };
  return (
    <TakeoffsView
      orgSlug={orgSlug}
      projectId={projectId}
      canRun={canRun}
      canManagePriceBooks={can("priceBook.write")}
      priceBooks={choices.priceBooks}
      casings={choices.casings}
    />
  );
}
