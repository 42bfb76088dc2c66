/** What a price-book material is for; the same words as the `material_kind` enum in db/tables/price-books.ts. */
export const MATERIAL_KINDS = ["casing", "stool", "apron", "extension", "other"] as const;
export type MaterialKind = (typeof MATERIAL_KINDS)[number];

export const KIND_LABELS: Record<MaterialKind, string> = {
  casing: "Casing",
  stool: "Stool",
  apron: "Apron",
  extension: "Extension stock",
  other: "Other",
};

/** "Extension stock", "extension", " CASING " → the kind; unknown words → null. */
export function readKind(text: string): MaterialKind | null {
  const t = text.trim().toLowerCase().replace(/\s+/g, " ");
  return MATERIAL_KINDS.find((k) => k === t || KIND_LABELS[k].toLowerCase() === t) ?? null;
}
