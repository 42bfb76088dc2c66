import { listOpeningTypes } from "@/db/queries/opening-types";
import { defaultPriceBookId } from "@/db/queries/price-gaps";
import type { ProjectScope } from "@/db/queries/project-scope";
import { requireProject } from "@/lib/server/projects/require-project";
import { getSettings } from "@/lib/server/settings/settings";
import { assessOpeningType } from "@/takeoff";
import { snapshotPrices } from "./snapshot";
import type { PriceGapsView } from "@/lib/plans/api-types";

export type { PriceGapsView };

/**
 * The window list against a price book, as the takeoff will see it — shown on the openings list so a
 * missing size is found while the list is being made, not after Run.
 */
export async function listPriceGaps(s: ProjectScope, priceBookId?: string): Promise<PriceGapsView> {
  await requireProject(s);
  const bookId = priceBookId ?? (await defaultPriceBookId(s));
  if (!bookId) return { priceBook: null, gaps: [] };
  const [prices, types, settings] = await Promise.all([snapshotPrices(s.orgId, bookId), listOpeningTypes(s), getSettings(s)]);
  const gaps: PriceGapsView["gaps"] = [];
  for (const ot of types) {
    const a = assessOpeningType({ ...ot, shape: ot.shape ?? undefined }, prices, settings.kerf, null, settings.scarfOverlap);
    if (!a.ok) {
      gaps.push({ openingTypeId: ot.id, mark: ot.mark, material: "", kind: "cannot-cut", message: `${ot.mark}: ${a.problem.message}`, fix: `Change ${a.problem.field.replace(/^trimSpec\./, "")} on this line.` });
      continue;
    }
    for (const g of a.gaps) gaps.push({ openingTypeId: ot.id, mark: ot.mark, material: g.material, kind: g.kind, message: g.message, fix: g.fix });
  }
  return { priceBook: prices.priceBook, gaps };
}
