import { randomBytes } from "node:crypto";
import { createPriceBook } from "@/db/queries/price-books";
import { createPriceBookItem } from "@/db/queries/price-book-items";
import { priceBookItemCreateSchema } from "@/lib/validators/price-book";

/** An item as a person would type it, through the same schema the API uses. */
export const casingInput = (over: Record<string, unknown> = {}) =>
  priceBookItemCreateSchema.parse({
    name: "Casing 2 1/2 colonial",
    kind: "casing",
    faceWidth: "2 1/2",
    thickness: "11/16",
    species: "Primed finger-joint pine",
    supplierCode: "TC-250",
    stock: [
      { length: "7'", price: "8.90" },
      { length: "8'", price: "10.15" },
    ],
    ...over,
  });

/** A price book with two items (one to edit, one to delete), written by the organisation's admin. */
export async function makePriceBook(s: { orgId: string; userId: string }) {
  const book = await createPriceBook({
    orgId: s.orgId,
    userId: s.userId,
    input: {
      name: `Shop prices ${randomBytes(3).toString("hex")}`,
      labour: { minutesPerOpening: { "stool-and-apron": 45, "picture-frame": 30 }, minutesPerExtensionFoot: 2, hourlyRate: 58 },
      markup: 0.15,
      taxRate: 0.0825,
    },
  });
  const scope = { ...s, priceBookId: book.id };
  const item = await createPriceBookItem(scope, casingInput());
  const spareItem = await createPriceBookItem(
    scope,
    casingInput({ name: "Stool 5 1/4 bullnose", kind: "stool", faceWidth: "5 1/4", thickness: "3/4", supplierCode: "TS-525", stock: [{ length: "10'", price: "34.00" }] }),
  );
  return { book, item, spareItem };
}
