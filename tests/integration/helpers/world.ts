import { randomBytes } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { memberships, users, type Role } from "@/db/schema";
import { createProject } from "@/lib/server/projects/projects";
import { createInvitation } from "@/lib/server/members/invitations";
import { signUp as signUpUser } from "@/lib/server/accounts/sign-up";
import { addPlanSet as createPlanSet } from "@/lib/server/plans/plan-sets";
import { addUnitType as createUnitType } from "@/lib/server/plans/unit-types";
import { addOpeningType as createOpeningType } from "@/lib/server/plans/opening-types";
import { addTag as createTag } from "@/lib/server/plans/tags";
import { sheetsOf as listSheets } from "@/lib/server/plans/sheets";
import { hashPassword } from "@/lib/auth/password";
import { makePriceBook } from "./price-book-world";

export const PASSWORD = "correct horse battery";
export const unique = () => randomBytes(4).toString("hex");

export interface Person {
  id: string;
  name: string;
  email: string;
  membershipId: string;
}

export async function addMember(orgId: string, role: Role, label: string): Promise<Person> {
  const email = `${label.toLowerCase()}-${unique()}@example.test`;
  const [user] = await db
    .insert(users)
    .values({ name: label, email, passwordHash: await hashPassword(PASSWORD) })
    .returning({ id: users.id, name: users.name, email: users.email });
  const [m] = await db.insert(memberships).values({ orgId, userId: user!.id, role }).returning({ id: memberships.id });
  return { ...user!, membershipId: m!.id };
}

/** An organisation with one member per role, a spare member to act on, a project and a pending invitation. */
export async function makeOrg(label = "Cedarline") {
  const { user, organisation } = await signUpUser({
    name: `${label} Admin`,
    email: `admin-${unique()}@example.test`,
    password: PASSWORD,
    organisationName: `${label} Trim ${unique()}`,
  });
  const [adminRow] = await db
    .select({ id: memberships.id })
    .from(memberships)
    .where(and(eq(memberships.orgId, organisation.id), eq(memberships.userId, user.id)));
  const admin: Person = { ...user, membershipId: adminRow!.id };
  const estimator = await addMember(organisation.id, "estimator", `${label}-Estimator`);
  const projectManager = await addMember(organisation.id, "project_manager", `${label}-PM`);
  const spare = await addMember(organisation.id, "estimator", `${label}-Spare`);
  const project = await createProject({
    orgId: organisation.id,
    userId: user.id,
    input: { name: `${label} Lofts`, generalContractor: "Harbor Ridge Builders", bidDue: "2027-03-15" },
  });
  const { invitation, token } = await createInvitation({
    orgId: organisation.id,
    invitedBy: user.id,
    email: `invitee-${unique()}@example.test`,
    role: "estimator",
  });
  const plans = await makePlans({ orgId: organisation.id, projectId: project.id, userId: user.id });
  return {
    priceBook: await makePriceBook({ orgId: organisation.id, userId: user.id }),
    plans,
    org: organisation,
    people: { admin, estimator, project_manager: projectManager } satisfies Record<Role, Person>,
    spare,
    project,
    invitation,
    inviteToken: token,
  };
}

export type World = Awaited<ReturnType<typeof makeOrg>>;

/**
 * A plan set of two ARCH D pages (2592 × 1728 pt), a unit type on the first, two opening types and a
 * tag. The file key is a placeholder: these rows exercise the API, not the upload path.
 */
export async function makePlans(s: { orgId: string; projectId: string; userId: string }) {
  const page = { width: 2592, height: 1728, rotation: 0, userUnit: 1 };
  const planSetId = await createPlanSet(s, { name: "A-set.pdf", key: `fixture-${unique()}`, size: 1234 }, [
    { pageNumber: 1, label: "A-201", ...page },
    { pageNumber: 2, label: null, ...page },
  ]);
  const [sheet, commonSheet] = await listSheets(s);
  const unitType = await createUnitType(s, { name: `Type A ${unique()}`, count: 12 });
  const w1 = await createOpeningType(s, { mark: "W1", width: 36, height: 60, setback: 0.5 });
  const w2 = await createOpeningType(s, { mark: "W2", width: 30, height: 48, setback: 0 });
  const tag = await createTag(s, { sheetId: sheet!.id, openingTypeId: w1.id, x: 400, y: 300 });
  return { planSetId, sheet: sheet!, commonSheet: commonSheet!, unitType, w1, w2, tag };
}
