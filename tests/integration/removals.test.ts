import { describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import * as sheetRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/sheets/[sheetId]/route";
import * as planSetRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/plan-sets/[planSetId]/route";
import * as openingTypeRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/opening-types/[openingTypeId]/route";
import { db } from "@/db/client";
import { sheets, tags } from "@/db/schema";
import { editSheet as updateSheet } from "@/lib/server/plans/sheets";
import { addTag as createTag } from "@/lib/server/plans/tags";
import { call, sessionCookie } from "./helpers/http";
import { snapshot } from "./helpers/snapshot";
import { makeOrg, type World } from "./helpers/world";

/** The world's A-201 under Type A (12 units) with three W1 tags: 3 tags, 36 openings in the job. */
async function tagged(w: World) {
  const s = { orgId: w.org.id, projectId: w.project.id, userId: w.people.estimator.id };
  await updateSheet(s, w.plans.sheet.id, { version: 1, unitTypeId: w.plans.unitType.id });
  for (const x of [700, 900]) await createTag(s, { sheetId: w.plans.sheet.id, openingTypeId: w.plans.w1.id, x, y: 300 });
  return s;
}

const del = async (w: World, handler: Parameters<typeof call>[0], path: string, params: Record<string, string>) =>
  call(handler, { method: "DELETE", path, params: { orgSlug: w.org.slug, projectId: w.project.id, ...params }, cookie: await sessionCookie(w.people.estimator) });

describe("deletes that take tags with them ask first", () => {
  it("an opening type in use: refused with its tag and opening counts until confirmed with ?tags=N, then gone with its tags", async () => {
    const w = await makeOrg("Sorrel");
    await tagged(w);
    const before = await snapshot();
    const asked = await del(w, openingTypeRoute.DELETE, "/x?version=1", { openingTypeId: w.plans.w1.id });
    expect(asked.status).toBe(409);
    expect(asked.json.error).toMatch(/3 tags on the drawings use W1 \(36 openings counted in the job\); deleting W1 removes them too\. Confirm/);
    expect(asked.json.removes).toEqual({ tags: 3, openings: 36 });
    const wrong = await del(w, openingTypeRoute.DELETE, "/x?version=1&tags=2", { openingTypeId: w.plans.w1.id });
    expect(wrong.status).toBe(409);
    expect(wrong.json.error).toMatch(/W1 now carries 3 tags \(36 openings counted in the job\), not 2 tags as you were shown/);
    expect((await del(w, openingTypeRoute.DELETE, "/x?version=1&tags=many", { openingTypeId: w.plans.w1.id })).json.fields?.tags).toMatch(/number of tags/);
    expect(await snapshot()).toBe(before);

    expect((await del(w, openingTypeRoute.DELETE, "/x?version=1&tags=3", { openingTypeId: w.plans.w1.id })).status).toBe(204);
    expect(await db.select().from(tags).where(eq(tags.openingTypeId, w.plans.w1.id))).toHaveLength(0);
  });

  it("a sheet: refused naming its tags and openings, deleted with them once confirmed", async () => {
    const w = await makeOrg("Sorrel");
    await tagged(w);
    const before = await snapshot();
    const asked = await del(w, sheetRoute.DELETE, "/x?version=2", { sheetId: w.plans.sheet.id });
    expect(asked.status).toBe(409);
    expect(asked.json.error).toMatch(/Deleting A-201 removes 3 tags \(36 openings counted in the job\)/);
    expect((await del(w, sheetRoute.DELETE, "/x?version=1&tags=3", { sheetId: w.plans.sheet.id })).status).toBe(409); // stale version
    expect(await snapshot()).toBe(before);
    expect((await del(w, sheetRoute.DELETE, "/x?version=2&tags=3", { sheetId: w.plans.sheet.id })).status).toBe(204);
    expect(await db.select().from(sheets).where(eq(sheets.id, w.plans.sheet.id))).toHaveLength(0);
    // An untagged sheet needs no confirmation.
    expect((await del(w, sheetRoute.DELETE, "/x?version=1", { sheetId: w.plans.commonSheet.id })).status).toBe(204);
  });

  it("a plan set: refused naming every sheet's tags, deleted with its sheets once confirmed", async () => {
    const w = await makeOrg("Sorrel");
    const s = await tagged(w);
    await createTag(s, { sheetId: w.plans.commonSheet.id, openingTypeId: w.plans.w2.id, x: 1, y: 1 });
    const before = await snapshot();
    const asked = await del(w, planSetRoute.DELETE, "/x", { planSetId: w.plans.planSetId });
    expect(asked.status).toBe(409);
    expect(asked.json.error).toMatch(/Deleting A-set\.pdf removes 4 tags \(37 openings counted in the job\)/);
    expect(await snapshot()).toBe(before);
    expect((await del(w, planSetRoute.DELETE, "/x?tags=4", { planSetId: w.plans.planSetId })).status).toBe(204);
    expect(await db.select().from(sheets).where(eq(sheets.planSetId, w.plans.planSetId))).toHaveLength(0);
  });
});
