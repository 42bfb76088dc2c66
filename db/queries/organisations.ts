import { eq } from "drizzle-orm";
import { db, type Tx } from "../client";
import { organisations } from "../schema";

export async function isOrgSlugTaken(slug: string, tx: Tx = db): Promise<boolean> {
  const taken = await tx.select({ id: organisations.id }).from(organisations).where(eq(organisations.slug, slug));
  return taken.length > 0;
}

export async function insertOrganisation(tx: Tx, values: { name: string; slug: string }) {
  const [org] = await tx.insert(organisations).values(values).returning({ id: organisations.id, slug: organisations.slug, name: organisations.name });
  return org!;
}
