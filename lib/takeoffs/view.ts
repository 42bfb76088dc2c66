import type { TakeoffView } from "@/db/queries/takeoffs";

/** A saved takeoff as it crosses to the browser: dates as ISO text, the same shape the API's JSON has. */
export type TakeoffDetail = Omit<TakeoffView, "createdAt" | "submittedAt"> & { createdAt: string; submittedAt: string | null };

/** One row of GET …/takeoffs: the headline figures only. */
export interface TakeoffListItem {
  id: string;
  name: string;
  note: string | null;
  status: "draft" | "submitted";
  createdAt: string;
  createdByName: string | null;
  submittedAt: string | null;
  priceBookName: string;
  openingsTotal: number;
  bidTotal: number;
}

/** Server pages hand the row over in the API's shape, so one client type serves both. */
export function toDetail(view: TakeoffView): TakeoffDetail {
  return { ...view, createdAt: view.createdAt.toISOString(), submittedAt: view.submittedAt?.toISOString() ?? null };
}

export const takeoffsApi = (orgSlug: string, projectId: string) => `/api/orgs/${orgSlug}/projects/${projectId}/takeoffs`;
export const takeoffsPage = (orgSlug: string, projectId: string) => `/${orgSlug}/projects/${projectId}/takeoffs`;
