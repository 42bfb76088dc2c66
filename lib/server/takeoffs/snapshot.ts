import { tallyCounts as getCounts } from "@/lib/server/plans/counts";
import { listOpeningTypes } from "@/db/queries/opening-types";
import type { ProjectScope } from "@/db/queries/project-scope";
import { findPriceBookRow, listPriceBookItemRows } from "@/db/queries/takeoffs";
import { listUnitTypes } from "@/db/queries/unit-types";
import { invalid } from "@/lib/errors";
import { getSettings } from "@/lib/server/settings/settings";
import type { TakeoffInputs, TakeoffPrices } from "@/takeoff";

/**
 * The window list, unit types and counts as they are now, with the company's kerf, waste, rip kerf and
 * board-order time limit. The rip kerf is left out while the company has none (the engine then rips with
 * the saw kerf); the time limit is always written, so a takeoff records the budget it was planned with.
 */
export async function snapshotInputs(s: ProjectScope, casingItemId: string | null, allowPlaceholders: boolean): Promise<TakeoffInputs> {
  const [settings, openingTypes, unitTypes, counts] = await Promise.all([getSettings(s), listOpeningTypes(s), listUnitTypes(s), getCounts(s)]);
  return {
    settings: {
      kerf: settings.kerf,
      wastePercent: settings.wastePercent,
      ...(settings.ripKerf !== null ? { ripKerf: settings.ripKerf } : {}),
      planSeconds: settings.planSeconds,
      scarfOverlap: settings.scarfOverlap,
    },
    casingItemId,
    ...(allowPlaceholders ? { allowPlaceholders: true } : {}),
    unitTypes: unitTypes.map((u) => ({ id: u.id, name: u.name, count: u.count })),
    // kind and shape only when they say something: a plain window's inputs (and input hash) stay as before kinds.
    openingTypes: openingTypes.map((o) => ({
      id: o.id,
      mark: o.mark,
      width: o.width,
      height: o.height,
      setback: o.setback,
      trimSpec: o.trimSpec,
      ...(o.kind !== "window" ? { kind: o.kind } : {}),
      ...(o.shape ? { shape: o.shape } : {}),
    })),
    counts: {
      perUnit: Object.fromEntries(counts.unitTypes.map((u) => [u.unitTypeId, u.perUnit])),
      commonAreas: counts.commonAreas,
      job: counts.job,
    },
  };
}

/** The price book's prices now: saved with the takeoff so a later price change never rewrites it. */
export async function snapshotPrices(orgId: string, priceBookId: string): Promise<TakeoffPrices> {
  const [book, items] = await Promise.all([findPriceBookRow(orgId, priceBookId), listPriceBookItemRows(orgId, priceBookId)]);
  if (!book) throw invalid({ priceBookId: "No such price book." });
  return {
    priceBook: { id: book.id, name: book.name },
    items: items.map((i) => ({
      id: i.id,
      name: i.name,
      kind: i.kind,
      faceWidth: i.faceWidth,
      thickness: i.thickness,
      species: i.species,
      supplierCode: i.supplierCode,
      stock: i.stock,
    })),
    labour: book.labour,
    markup: book.markup,
    taxRate: book.taxRate,
    taxLabour: book.taxLabour,
  };
}
