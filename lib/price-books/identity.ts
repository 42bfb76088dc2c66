import { KIND_LABELS } from "./kinds";
import type { ItemFields } from "./types";

/**
 * How an item is recognised: by its supplier code when it has one, else by name and kind. Both must be
 * unique within a book, or a CSV row could not say which item it means. Case and spacing do not count.
 */
export const codeKey = (code: string | null | undefined): string | null => {
  const t = code?.trim().toLowerCase() ?? "";
  return t === "" ? null : t;
};

export const nameKey = (item: Pick<ItemFields, "name" | "kind">): string => `${item.kind}:${item.name.trim().replace(/\s+/g, " ").toLowerCase()}`;

type Keyed = Pick<ItemFields, "name" | "kind" | "supplierCode"> & { id?: string };

/** The field that would clash with another item of the book, and a message for it; null when none does. */
export function findClash(items: readonly Keyed[], candidate: Keyed, exceptId?: string): { field: "supplierCode" | "name"; message: string } | null {
  const others = items.filter((i) => i.id === undefined || i.id !== exceptId);
  const code = codeKey(candidate.supplierCode);
  const byCode = code ? others.find((i) => codeKey(i.supplierCode) === code) : undefined;
  if (byCode) return { field: "supplierCode", message: `Supplier code ${candidate.supplierCode?.trim()} is already used by "${byCode.name}".` };
  const byName = others.find((i) => nameKey(i) === nameKey(candidate));
  if (byName) return { field: "name", message: `This book already has ${KIND_LABELS[candidate.kind].toLowerCase()} named "${byName.name}".` };
  return null;
}
