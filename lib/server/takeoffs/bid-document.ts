import type { ProjectScope } from "@/db/queries/project-scope";
import { findBidContext } from "@/db/queries/takeoff-documents";
import { orNotFound } from "@/lib/errors";
import { bidSummaryPdf } from "@/lib/takeoffs/bid-pdf";
import { getTakeoff } from "./takeoffs";

/** How long a bid holds: 30 days is a common validity for trim bids (common practice). */
export const BID_VALID_DAYS = 30;

/** The bid summary PDF of one takeoff, for the general contractor, with the rows it was made from. */
export async function bidDocument(s: ProjectScope, takeoffId: string, issuedAt = new Date()) {
  const takeoff = await getTakeoff(s, takeoffId);
  const project = orNotFound(await findBidContext(s), "No such project.");
  const bytes = await bidSummaryPdf({
    orgName: project.orgName,
    project: { name: project.name, generalContractor: project.generalContractor, bidDue: project.bidDue },
    takeoffName: takeoff.name,
    priceBookName: takeoff.prices.priceBook.name,
    pricesAsOf: takeoff.createdAt,
    result: takeoff.result,
    issuedAt,
    validDays: BID_VALID_DAYS,
  });
  return { takeoff, project, bytes };
}
