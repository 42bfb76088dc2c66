import { and, desc, eq } from "drizzle-orm";
import { db } from "../client";
import { organisations, projects, takeoffSends, users } from "../schema";
import type { ProjectScope } from "./project-scope";

/** What a bid document names besides the takeoff: the company and the project. */
export async function findBidContext(s: ProjectScope) {
  const [row] = await db
    .select({ orgName: organisations.name, name: projects.name, generalContractor: projects.generalContractor, bidDue: projects.bidDue })
    .from(projects)
    .innerJoin(organisations, eq(organisations.id, projects.orgId))
    .where(and(eq(projects.orgId, s.orgId), eq(projects.id, s.projectId)));
  return row ?? null;
}

export async function insertSend(orgId: string, values: { takeoffId: string; to: string; subject: string; sentBy: string }) {
  await db.insert(takeoffSends).values({ orgId, ...values });
}

export async function listSendRows(orgId: string, takeoffId: string) {
  return db
    .select({ to: takeoffSends.to, subject: takeoffSends.subject, sentAt: takeoffSends.sentAt, sentByName: users.name })
    .from(takeoffSends)
    .leftJoin(users, eq(users.id, takeoffSends.sentBy))
    .where(and(eq(takeoffSends.orgId, orgId), eq(takeoffSends.takeoffId, takeoffId)))
    .orderBy(desc(takeoffSends.sentAt));
}
