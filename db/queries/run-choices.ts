import { and, asc, eq } from "drizzle-orm";
import { db } from "../client";
import { priceBookItems, priceBooks } from "../schema";

/** The books and casings a takeoff run may choose from: names and sizes only, never prices. */
export async function listRunChoices(orgId: string) {
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
