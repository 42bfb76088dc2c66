import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { priceBooks } from "@/db/schema";
import { createPriceBook } from "@/lib/server/price-books/books";
import { createPriceBookItem } from "@/lib/server/price-books/items";
import { priceBookItemCreateSchema } from "@/lib/validators/price-books";
import { seedOnce } from "./seed-marks";

/**
 * The demo organisation's price book. Everything here is invented for the demo: the supplier (a
 * made-up mill in the made-up town of Alder Bend), its item codes (marked DEMO- so nobody mistakes
 * them for a real catalogue), the prices and the labour rates. Prices rise faster than length, as
 * long clear boards cost more per foot.
 */
export const DEMO_PRICE_BOOK_NAME = "Alder Bend Millwork — 2027";

const LENGTHS = ["7'", "8'", "10'", "12'", "14'", "16'"] as const;
type Row = [name: string, kind: string, faceWidth: string, thickness: string, species: string, code: string, prices: (string | null)[]];

const FJ = "Primed finger-joint pine";
const ITEMS: Row[] = [
  ["Casing 2 1/2 colonial", "casing", "2 1/2", "11/16", FJ, "DEMO-C250-FJ", ["6.85", "7.60", "9.95", "12.40", "15.10", "17.95"]],
  ["Casing 2 1/2 colonial", "casing", "2 1/2", "11/16", "Poplar", "DEMO-C250-PO", ["11.20", "12.45", "16.30", "20.10", "24.60", "29.40"]],
  ["Casing 3 1/2 flat", "casing", "3 1/2", "3/4", FJ, "DEMO-C350-FJ", ["9.40", "10.35", "13.60", "16.95", "20.70", "24.50"]],
  ["Casing 3 1/2 flat", "casing", "3 1/2", "3/4", "Poplar", "DEMO-C350-PO", ["15.60", "17.30", "22.40", "27.90", "33.80", "39.95"]],
  ["Stool 5 1/4 bullnose", "stool", "5 1/4", "3/4", "Poplar", "DEMO-S525-PO", [null, "24.80", "32.10", "39.50", "47.60", "55.20"]],
  ["Apron 2 1/2 colonial", "apron", "2 1/2", "11/16", FJ, "DEMO-A250-FJ", ["6.95", "7.70", "10.05", "12.55", null, null]],
  ["Apron 3 1/2 flat", "apron", "3 1/2", "3/4", "Poplar", "DEMO-A350-PO", ["15.80", "17.45", "22.60", "28.15", null, null]],
  ["Extension board 1×4", "extension", "3 1/2", "3/4", "Poplar", "DEMO-E104-PO", [null, "13.90", "18.20", "22.60", "27.40", "31.80"]],
  ["Extension board 1×6", "extension", "5 1/2", "3/4", "Poplar", "DEMO-E106-PO", [null, "21.40", "27.90", "34.10", "41.20", "47.90"]],
  ["Extension board 1×8", "extension", "7 1/4", "3/4", "Poplar", "DEMO-E108-PO", [null, "29.60", "38.40", "46.90", "56.30", "65.10"]],
];

/** One demo book per organisation, keyed by the organisation rather than by the book's (renamable) name. */
const seedKey = (orgId: string) => `price-book:${orgId}`;

/**
 * Adds the book to the organisation once, found again by its seed key however it has been renamed since;
 * returns its id and whether it was made now.
 */
export async function seedDemoPriceBook(orgId: string, userId: string): Promise<{ id: string; created: boolean }> {
  return seedOnce(
    seedKey(orgId),
    async () => {
      // Seeded before seed keys existed: the book still carries the seeded name.
      const [found] = await db.select({ id: priceBooks.id }).from(priceBooks).where(and(eq(priceBooks.orgId, orgId), eq(priceBooks.name, DEMO_PRICE_BOOK_NAME)));
      return found?.id ?? null;
    },
    () => createDemoPriceBook(orgId, userId),
  );
}

async function createDemoPriceBook(orgId: string, userId: string): Promise<string> {
  const book = await createPriceBook({
    orgId,
    userId,
    input: {
      name: DEMO_PRICE_BOOK_NAME,
      labour: { minutesPerOpening: { "stool-and-apron": 45, "picture-frame": 30 }, minutesPerExtensionFoot: 2, hourlyRate: 58, minutesPerDoorSide: 25, minutesPerMull: 15, minutesArchPremium: 60, minutesPerBayCorner: 20 },
      markup: 0.15,
      taxRate: 0.0825,
      taxLabour: false,
    },
  });
  for (const [name, kind, faceWidth, thickness, species, supplierCode, prices] of ITEMS) {
    const stock = LENGTHS.flatMap((length, i) => (prices[i] ? [{ length, price: prices[i] }] : []));
    const input = priceBookItemCreateSchema.parse({ name: `${name} — ${species === FJ ? "FJ pine" : species.toLowerCase()}`, kind, faceWidth, thickness, species, supplierCode, stock });
    await createPriceBookItem({ orgId, userId, priceBookId: book.id }, input);
  }
  return book.id;
}
