import { beforeEach, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import * as takeoffsRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/takeoffs/route";
import * as takeoffRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/takeoffs/[takeoffId]/route";
import { db } from "@/db/client";
import { priceBookItems, takeoffs, type Role } from "@/db/schema";
import { addOpeningType as createOpeningType } from "@/lib/server/plans/opening-types";
import { addTag as createTag } from "@/lib/server/plans/tags";
import { computeTakeoff } from "@/takeoff";
import type { TakeoffView } from "@/lib/server/takeoffs/takeoffs";
import { call, sessionCookie } from "./helpers/http";
import { snapshot } from "./helpers/snapshot";
import { addTestPriceBook } from "./helpers/takeoff-world";
import { makeOrg, type World } from "./helpers/world";

let home: World;
let other: World;
let book: Awaited<ReturnType<typeof addTestPriceBook>>;
beforeEach(async () => {
  home = await makeOrg("Whitlow");
  other = await makeOrg("Brindle");
  book = await addTestPriceBook(home.org.id);
});

const params = (w: World) => ({ orgSlug: w.org.slug, projectId: w.project.id });
const run = async (as: Role | "outsider" | "anonymous", body: Record<string, unknown> = {}) =>
  call(takeoffsRoute.POST, {
    method: "POST",
    path: "/x",
    params: params(home),
    body: { name: "Base bid", priceBookId: book.priceBookId, ...body },
    cookie: as === "anonymous" ? undefined : await sessionCookie(as === "outsider" ? other.people.admin : home.people[as]),
  });

describe("takeoffs: who may run and read them", () => {
  const cases: [Role | "outsider" | "anonymous", number, number][] = [
    ["admin", 201, 200],
    ["estimator", 201, 200],
    ["project_manager", 403, 200],
    ["outsider", 404, 404],
    ["anonymous", 401, 401],
  ];
  it.each(cases)("%s: run → %i, read → %i", async (actor, runStatus, readStatus) => {
    const existing = (await run("estimator")).json.takeoff as TakeoffView;
    const before = await snapshot();
    const res = await run(actor, { name: "Alternate" });
    expect(res.status).toBe(runStatus);
    if (runStatus !== 201) expect(await snapshot()).toBe(before);
    const cookie = actor === "anonymous" ? undefined : await sessionCookie(actor === "outsider" ? other.people.admin : home.people[actor]);
    const list = await call(takeoffsRoute.GET, { method: "GET", path: "/x", params: params(home), cookie });
    const one = await call(takeoffRoute.GET, { method: "GET", path: "/x", params: { ...params(home), takeoffId: existing.id }, cookie });
    expect([list.status, one.status]).toEqual([readStatus, readStatus]);
  });

  it("another organisation's takeoff id through your own slug is a 404", async () => {
    const theirBook = await addTestPriceBook(other.org.id);
    const theirs = await call(takeoffsRoute.POST, {
      method: "POST",
      path: "/x",
      params: params(other),
      body: { name: "Theirs", priceBookId: theirBook.priceBookId },
      cookie: await sessionCookie(other.people.estimator),
    });
    expect(theirs.status).toBe(201);
    const id = (theirs.json.takeoff as TakeoffView).id;
    const res = await call(takeoffRoute.GET, { method: "GET", path: "/x", params: { ...params(home), takeoffId: id }, cookie: await sessionCookie(home.people.admin) });
    expect(res.status).toBe(404);
    // Nor can their price book price our job.
    expect((await run("estimator", { priceBookId: theirBook.priceBookId })).json.fields).toEqual({ priceBookId: "No such price book." });
  });
});

describe("running a takeoff", () => {
  it("through the API equals the engine's result for the same inputs and prices", async () => {
    const res = await run("estimator");
    expect(res.status).toBe(201);
    const saved = res.json.takeoff as TakeoffView;
    expect(saved.result).toEqual(JSON.parse(JSON.stringify(await computeTakeoff(saved.inputs, saved.prices))));
    // The world tags one W1 on a sheet with no unit type yet (a common area): one opening in the job.
    expect(saved.result.openingsTotal).toBe(1);
    expect(saved.inputs.counts.job).toEqual({ [home.plans.w1.id]: 1 });
  });

  it("keeps its price snapshot when the price book changes later", async () => {
    const first = (await run("estimator")).json.takeoff as TakeoffView;
    for (const item of book.items) {
      await db.update(priceBookItems).set({ stock: [{ length: 96, price: 99 }, { length: 144, price: 150 }] }).where(eq(priceBookItems.id, item.id));
    }
    const again = await call(takeoffRoute.GET, { method: "GET", path: "/x", params: { ...params(home), takeoffId: first.id }, cookie: await sessionCookie(home.people.project_manager) });
    expect((again.json.takeoff as TakeoffView).result.bid).toEqual(first.result.bid);
    expect((again.json.takeoff as TakeoffView).prices).toEqual(first.prices);
    const second = (await run("estimator", { name: "After the price change" })).json.takeoff as TakeoffView;
    expect(second.result.bid.material).toBeGreaterThan(first.result.bid.material);
  });

  it("refuses, naming the field, when the price book lacks a size the windows need — and saves nothing", async () => {
    await createOpeningType({ orgId: home.org.id, projectId: home.project.id }, { mark: "W7", width: 40, height: 60, setback: 9, trimSpec: { casingWidth: 2.5 } });
    const w7 = (await db.select().from((await import("@/db/schema")).openingTypes)).find((o) => o.mark === "W7" && o.projectId === home.project.id)!;
    await createTag({ orgId: home.org.id, projectId: home.project.id, userId: home.people.estimator.id }, { sheetId: home.plans.sheet.id, openingTypeId: w7.id, x: 5, y: 5 });
    const before = await snapshot();
    const res = await run("estimator");
    expect(res.status).toBe(422);
    expect(res.json.fields?.priceBookId).toMatch(/W7 needs stool at least 10" wide/);
    expect(await snapshot()).toBe(before);
    expect(await db.select().from(takeoffs).where(eq(takeoffs.projectId, home.project.id))).toHaveLength(0);
  });

  it("worked example through the whole path (tags → takeoff → cut list), JLC 'Production Jamb Extensions': 3 1/2 in casing, 1/4 in reveals → stool 8 in longer than the jamb opening", async () => {
    const scope = { orgId: home.org.id, projectId: home.project.id };
    const w9 = await createOpeningType(scope, { mark: "W9", width: 30, height: 48, setback: 0.75, trimSpec: { casingWidth: 3.5, casingThickness: 0.75, reveal: 0.25, stoolHorn: 0.25 } });
    await createTag({ ...scope, userId: home.people.estimator.id }, { sheetId: home.plans.commonSheet.id, openingTypeId: w9.id, x: 10, y: 10 });
    const saved = (await run("estimator")).json.takeoff as TakeoffView;
    const line = saved.result.openingTypes.find((o) => o.mark === "W9")!;
    expect(line.quantity).toBe(1);
    expect(line.cutList.find((p) => p.part === "stool")!.length).toBe(38);
  });
});
