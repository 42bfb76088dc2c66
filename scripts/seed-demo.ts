// Seeds the demo organisations once; running it again adds nothing. `--list` prints the logins.
import { eq } from "drizzle-orm";
import { db, pool } from "@/db/client";
import { memberships, organisations, projects, users } from "@/db/schema";
import { getUserByEmail, uniqueOrgSlug } from "@/db/queries/users";
import { hashPassword } from "@/lib/auth/password";
import { seedDemoPlans } from "@/db/seed/demo-plans";
import { seedDemoPriceBook } from "@/db/seed/demo-price-book";
import { seedDemoTakeoffs } from "@/db/seed/demo-takeoffs";
import { DEMO_PASSWORD, demoOrgs, demoPeople, roleOfLogin } from "@/db/seed/demo-data";

if (process.argv.includes("--list")) {
  for (const p of demoPeople) console.log(`    ${p.email.padEnd(28)} ${roleOfLogin[p.key]}`);
  process.exit(0);
}

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
  const [found] = await db.select({ id: organisations.id }).from(organisations).where(eq(organisations.name, o.name));
  if (found) continue;
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
    await tx.insert(projects).values(o.projects.map((p) => ({ ...p, orgId, createdBy: owner })));
  });
  created++;
}
const birchmoor = demoOrgs[0]!;
const [org] = await db.select({ id: organisations.id }).from(organisations).where(eq(organisations.name, birchmoor.name));
const owner = ids.get(birchmoor.owner)!;
const plans = await seedDemoPlans(org!.id, birchmoor.projects[0]!.name, owner);
const prices = await seedDemoPriceBook(org!.id, owner);
const takeoffs = await seedDemoTakeoffs(org!.id, birchmoor.projects[0]!.name, ids.get("estimator")!);
const added = [plans && "the demo plan set", prices && "a price book", takeoffs && "two takeoffs"].filter(Boolean);
console.log(created || added.length ? `seeded ${created} organisation(s)${added.length ? `, ${added.join(", ")}` : ""}` : "demo data already present");
await pool.end();
