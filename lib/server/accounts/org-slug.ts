import type { Tx } from "@/db/client";
import { isOrgSlugTaken } from "@/db/queries/organisations";
import { conflict } from "@/lib/errors";
import { slugify, slugSuffix } from "@/lib/slug";

/** Picks a slug nobody has: the plain one if free, else with a short random suffix. */
export async function uniqueOrgSlug(name: string, tx?: Tx): Promise<string> {
  const base = slugify(name);
  for (let attempt = 0; attempt < 5; attempt++) {
    const slug = attempt === 0 ? base : `${base}-${slugSuffix()}`;
    if (!(await isOrgSlugTaken(slug, tx))) return slug;
  }
  throw conflict("Could not choose an address for the organisation; try another name.");
}
