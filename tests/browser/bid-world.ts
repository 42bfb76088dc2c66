import { expect, type Page } from "@playwright/test";
import { openNav } from "./helpers";
import { db } from "@/db/client";
import { memberships, users } from "@/db/schema";
import { createProject } from "@/lib/server/projects/projects";
import { addOpeningType as createOpeningType } from "@/lib/server/plans/opening-types";
import { addPlanSet as createPlanSet } from "@/lib/server/plans/plan-sets";
import { sheetsOf as listSheets, editSheet as updateSheet } from "@/lib/server/plans/sheets";
import { addTag as createTag } from "@/lib/server/plans/tags";
import { addUnitType as createUnitType } from "@/lib/server/plans/unit-types";
import { signUp as signUpUser } from "@/lib/server/accounts/sign-up";
import { seedDemoPriceBook } from "@/scripts/seed/demo-price-book";
import { hashPassword } from "@/lib/auth/password";
import { DEMO_WINDOW_TYPES, generatePlanSet, type WindowMark } from "@/scripts/demo-plan";
import { inspectPdf } from "@/lib/pdf/inspect";
import { pointAtUploadStandInUnlessConfigured } from "@/lib/uploads/config";
import { UTApi, UTFile } from "uploadthing/server";

/**
 * The state a bid starts from, set up directly (the plans and sign-up screens have their own tests):
 * a company with an admin, an estimator and a project manager, a tagged project and a price book.
 */
export async function seedBidWorld(id: string, more?: (w: { orgId: string; projectId: string; adminId: string; estimatorId: string }) => Promise<void>) {
  const password = "finish-nailer-5555";
  const orgName = `Harrowgate Trim ${id}`;
  const { user: admin, organisation } = await signUpUser({ name: "Ada Harrow", email: `ada.${id}@harrowgate.test`, password, organisationName: orgName });
  const member = async (name: string, email: string, role: "estimator" | "project_manager") => {
    const [u] = await db.insert(users).values({ name, email, passwordHash: await hashPassword(password) }).returning({ id: users.id, email: users.email });
    await db.insert(memberships).values({ orgId: organisation.id, userId: u!.id, role });
    return u!;
  };
  const estimator = await member("Eli Brandt", `eli.${id}@harrowgate.test`, "estimator");
  const manager = await member("Mara Quint", `mara.${id}@harrowgate.test`, "project_manager");
  const projectName = `Larkspur Commons C ${id}`;
  const project = await createProject({ orgId: organisation.id, userId: admin.id, input: { name: projectName, generalContractor: "Fenwick & Hale Builders", bidDue: "2027-02-12" } });
  const scope = { orgId: organisation.id, projectId: project.id, userId: admin.id };

  const { bytes, sheets: drawn } = await generatePlanSet({ unitTypes: ["A", "B"] });
  // Stored through the upload service like a real upload, so the sheets open in the viewer.
  pointAtUploadStandInUnlessConfigured();
  const [stored] = await new UTApi().uploadFiles([new UTFile([Buffer.from(bytes)], "set.pdf", { type: "application/pdf" })]);
  if (!stored?.data) throw new Error(`could not store the plan set: ${stored?.error?.message ?? "no answer"}`);
  await createPlanSet(scope, { key: stored.data.key, name: "set.pdf", size: bytes.byteLength }, (await inspectPdf(bytes)).pages);
  const units = { "Type A": (await createUnitType(scope, { name: "Type A", count: 12 })).id, "Type B": (await createUnitType(scope, { name: "Type B", count: 8 })).id } as Record<string, string>;
  const types = new Map<string, string>();
  for (const [mark, size] of Object.entries(DEMO_WINDOW_TYPES) as [WindowMark, (typeof DEMO_WINDOW_TYPES)[WindowMark]][]) {
    const trimSpec = mark === "W3" ? { casingWidth: 3.5, casingThickness: 0.75 } : {};
    types.set(mark, (await createOpeningType(scope, { mark, width: size.widthInches, height: size.heightInches, setback: 1.4375, trimSpec })).id);
  }
  for (const [i, sheet] of (await listSheets(scope)).entries()) {
    const plan = drawn[i]!;
    await updateSheet(scope, sheet.id, { version: sheet.version, unitTypeId: plan.unitTypeName ? (units[plan.unitTypeName] ?? null) : null });
    for (const w of plan.windows) await createTag(scope, { sheetId: sheet.id, openingTypeId: types.get(w.mark)!, x: w.x, y: w.y });
  }
  await seedDemoPriceBook(organisation.id, admin.id);
  // The pool stays open: several spec files seed a world in the same worker process.
  // A spec's own additions, while the pool is still open.
  await more?.({ orgId: organisation.id, projectId: project.id, adminId: admin.id, estimatorId: estimator.id });

  return {
    password,
    orgName,
    orgSlug: organisation.slug,
    projectId: project.id,
    projectName,
    admin,
    estimator,
    manager,
    /** The admin opens the price book from the header and changes the 12' price of the FJ pine 2 1/2 casing. */
    async editPriceThroughUi(page: Page) {
      await openNav(page, "Price books");
      await page.getByRole("link", { name: /Alder Bend Millwork/ }).click();
      const cell = page.getByRole("button", { name: /^12' price of Casing 2 1\/2 colonial — FJ pine: .*Edit$/ });
      await cell.click();
      const input = page.getByLabel(/^12' price of Casing 2 1\/2 colonial — FJ pine/);
      await input.fill("11.25");
      await input.press("Enter");
      await expect(page.getByRole("button", { name: /^12' price of Casing 2 1\/2 colonial — FJ pine: \$?11\.25\. Edit$/ })).toBeVisible();
      // …and the change is on record, by this admin.
      await expect(page.getByText(/Ada Harrow/).first()).toBeVisible();
    },
  };
}
