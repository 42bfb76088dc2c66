import { and, desc, eq } from "drizzle-orm";
import { db } from "../client";
import { organisations, projects, takeoffSends, users } from "../schema";
import { bidSummaryPdf } from "@/lib/takeoffs/bid-pdf";
import { getTakeoff } from "./takeoffs";
import type { ProjectScope } from "./project-scope";

/** How long a bid holds: 30 days is a common validity for trim bids (common practice). */
export const BID_VALID_DAYS = 30;

export async function bidDocument(s: ProjectScope, takeoffId: string, issuedAt = new Date()) {
  const takeoff = await getTakeoff(s, takeoffId);
  const [ctx] = await db
    .select({ orgName: organisations.name, name: projects.name, generalContractor: projects.generalContractor, bidDue: projects.bidDue })
    .from(projects)
    .innerJoin(organisations, eq(organisations.id, projects.orgId))
    .where(and(eq(projects.orgId, s.orgId), eq(projects.id, s.projectId)));
  const bytes = await bidSummaryPdf({
    orgName: ctx!.orgName,
    project: { name: ctx!.name, generalContractor: ctx!.generalContractor, bidDue: ctx!.bidDue },
    takeoffName: takeoff.name,
    priceBookName: takeoff.prices.priceBook.name,
    pricesAsOf: takeoff.createdAt,
    result: takeoff.result,
    issuedAt,
    validDays: BID_VALID_DAYS,
  });
  return { takeoff, project: ctx!, bytes };
}

export async function recordSend(s: ProjectScope & { userId: string }, takeoffId: string, to: string, subject: string) {
  await db.insert(takeoffSends).values({ orgId: s.orgId, takeoffId, to, subject, sentBy: s.userId });
}

export async function listSends(s: ProjectScope, takeoffId: string) {
  await getTakeoff(s, takeoffId);
  return db
    .select({ to: takeoffSends.to, subject: takeoffSends.subject, sentAt: takeoffSends.sentAt, sentByName: users.name })
    .from(takeoffSends)
    .leftJoin(users, eq(users.id, takeoffSends.sentBy))
    .where(and(eq(takeoffSends.orgId, s.orgId), eq(takeoffSends.takeoffId, takeoffId)))
    .orderBy(desc(takeoffSends.sentAt));
}
