// Seeds the demo organisations once; running it again adds nothing. `--list` prints the logins.
// Everything seeded is found again by a seed key fixed here (db/tables/seed-marks.ts), not by its name, so
// renaming the demo company, project or price book does not make the next `npm run demo` seed a second one.
import { and, eq } from "drizzle-orm";
import { db, pool } from "@/db/client";
import { memberships, organisations, projects, users } from "@/db/schema";
import { getUserByEmail } from "@/db/queries/users";
import { uniqueOrgSlug } from "@/lib/server/accounts/org-slug";
import { hashPassword } from "@/lib/auth/password";
import { seedDemoPlans } from "@/scripts/seed/demo-plans";
import { seedDemoPriceBook } from "@/scripts/seed/demo-price-book";
import { seedDemoTakeoffs } from "@/scripts/seed/demo-takeoffs";
import { DEMO_PASSWORD, demoOrgs, demoPeople, roleOfLogin } from "@/scripts/seed/demo-data";
import { markSeeded, seededRow } from "@/scripts/seed/seed-marks";

if (process.argv.includes("--list")) {
  for (const p of demoPeople) console.log(`    ${p.email.padEnd(28)} ${roleOfLogin[p.key]}`);
  process.exit(0);
}

const orgKey = (name: string) => `org:${name}`;
const projectKey = (orgName: string, name: string) => `project:${orgName}:${name}`;

const ids = new Map<string, string>();
const passwordHash = await hashPassword(DEMO_PASSWORD);
for (const p of demoPeople) {
  const existing = await getUserByEmail(p.email);
  const id =
    existing?.id ??
    (await db.insert(users).values({ name: p.name, email: p.email, passwordHash }).returning({ id: users.id }))[0]!.id;
  ids.set(p.key, id);
}

let created = 0;
for (const o of demoOrgs) {
  if (await seededRow(orgKey(o.name))) continue;
  // Seeded before seed keys existed: adopt the organisation (and its projects) by the seeded names.
  const [found] = await db.select({ id: organisations.id }).from(organisations).where(eq(organisations.name, o.name));
  if (found) {
    await markSeeded(orgKey(o.name), found.id);
    for (const p of o.projects) {
      const [project] = await db.select({ id: projects.id }).from(projects).where(and(eq(projects.orgId, found.id), eq(projects.name, p.name)));
      if (project) await markSeeded(projectKey(o.name, p.name), project.id);
    }
    continue;
  }
  // One transaction per organisation, so an interrupted seed leaves nothing half-made.
  await db.transaction(async (tx) => {
    const [org] = await tx
      .insert(organisations)
      .values({ name: o.name, slug: await uniqueOrgSlug(o.name, tx) })
      .returning({ id: organisations.id });
    const orgId = org!.id;
    const owner = ids.get(o.owner)!;
    await tx.insert(memberships).values([
      { orgId, userId: owner, role: "admin" as const },
      ...o.members.map((m) => ({ orgId, userId: ids.get(m.person)!, role: m.role })),
    ]);
    const made = await tx
      .insert(projects)
      .values(o.projects.map((p) => ({ ...p, orgId, createdBy: owner })))
      .returning({ id: projects.id, name: projects.name });
    await markSeeded(orgKey(o.name), orgId, tx);
    for (const p of made) await markSeeded(projectKey(o.name, p.name), p.id, tx);
  });
  created++;
}
const birchmoor = demoOrgs[0]!;
const orgId = await seededRow(orgKey(birchmoor.name));
const [org] = orgId ? await db.select({ id: organisations.id }).from(organisations).where(eq(organisations.id, orgId)) : [];
const added: string[] = [];
if (org) {
  const owner = ids.get(birchmoor.owner)!;
  const projectId = await seededRow(projectKey(birchmoor.name, birchmoor.projects[0]!.name));
  if (await seedDemoPlans(org.id, projectId, owner)) added.push("the demo plan set");
  const book = await seedDemoPriceBook(org.id, owner);
  if (book.created) added.push("a price book");
  if (await seedDemoTakeoffs(org.id, projectId, book.id, ids.get("estimator")!)) added.push("two takeoffs");
}
console.log(created || added.length ? `seeded ${created} organisation(s)${added.length ? `, ${added.join(", ")}` : ""}` : "demo data already present");
await pool.end();
