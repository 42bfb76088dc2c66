/**
 * What the price-book API answers with, shared by the route handlers and the client views.
 * Lengths are inches, prices dollars, markup and tax fractions (0.15 is 15 %).
 */
import type { LabourRates } from "@/takeoff";
import type { MaterialKind } from "./kinds";

export interface StockPrice {
  length: number;
  price: number;
}

/** The fields of an item a person edits; what the CSV carries and the change log compares. */
export interface ItemFields {
  name: string;
  kind: MaterialKind;
  faceWidth: number;
  thickness: number;
  species: string | null;
  supplierCode: string | null;
  stock: StockPrice[];
}

export interface PriceBookItemView extends ItemFields {
  id: string;
  version: number;
}

export interface PriceBookSummary {
  id: string;
  name: string;
  labour: LabourRates;
  markup: number;
  taxRate: number;
  taxLabour: boolean;
  version: number;
  updatedAt: string | Date;
}

export interface PriceBookListEntry extends PriceBookSummary {
  itemCount: number;
}

export interface PriceBookView extends PriceBookSummary {
  items: PriceBookItemView[];
}

export type FieldDiff = Record<string, { before: unknown; after: unknown }>;

export interface PriceBookChangeView {
  id: string;
  action: string;
  itemId: string | null;
  summary: string;
  diff: FieldDiff | null;
  at: string | Date;
  userId: string | null;
  /** Null when the person has since been removed from Miterwise. */
  userName: string | null;
}
