import { beforeEach, describe, expect, it } from "vitest";
import * as settingsRoute from "@/app/api/orgs/[orgSlug]/settings/route";
import * as openingTypesRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/opening-types/route";
import * as takeoffsRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/takeoffs/route";
import type { Role } from "@/db/schema";
import type { TakeoffView } from "@/lib/server/takeoffs/takeoffs";
import { formatLengthExact } from "@/takeoff";
import { call, sessionCookie } from "./helpers/http";
import { snapshot } from "./helpers/snapshot";
import { addTestPriceBook } from "./helpers/takeoff-world";
import { makeOrg, type World } from "./helpers/world";

type Actor = Role | "outsider" | "anonymous";
let home: World;
let other: World;
beforeEach(async () => {
  home = await makeOrg("Pennywort");
  other = await makeOrg("Larchmere");
});
const cookieOf = async (a: Actor) => (a === "anonymous" ? undefined : sessionCookie(a === "outsider" ? other.people.admin : home.people[a]));
const patch = async (body: unknown, actor: Actor = "admin") =>
  call(settingsRoute.PATCH, { method: "PATCH", path: "/x", params: { orgSlug: home.org.slug }, body, cookie: await cookieOf(actor) });

describe("company settings", () => {
  it.each([
    ["admin", 200, 200],
    ["estimator", 200, 403],
    ["project_manager", 200, 403],
    ["outsider", 404, 404],
    ["anonymous", 401, 401],
  ] as const)("%s: read → %i, change → %i", async (actor, read, write) => {
    expect((await call(settingsRoute.GET, { method: "GET", path: "/x", params: { orgSlug: home.org.slug }, cookie: await cookieOf(actor) })).status).toBe(read);
    const before = await snapshot();
    expect((await patch({ wastePercent: 7 }, actor)).status).toBe(write);
    if (write !== 200) expect(await snapshot()).toBe(before);
  });

  it.each([
    [{ kerf: "3/4" }, "kerf", /at most 1\/2/],
    [{ wastePercent: -1 }, "wastePercent", /negative/],
    [{ trimDefaults: { style: "stool-and-apron", casingWidth: 2.5, casingThickness: 0.75, reveal: 2.5 } }, "trimDefaults.reveal", /less than the casing width/],
    [{ colour: "green" }, "_", /Unrecognized|colour/],
  ])("refuses %j naming %s, changing nothing", async (body, field, message) => {
    const before = await snapshot();
    const res = await patch(body);
    expect(res.status).toBe(422);
    expect(res.json.fields?.[field]).toMatch(message);
    expect(await snapshot()).toBe(before);
  });

  it("names every wrong field in one answer, not only the first", async () => {
    const before = await snapshot();
    const res = await patch({ trimDefaults: { style: "stool-and-apron", casingWidth: 2.5, casingThickness: -1, reveal: 3 }, kerf: "3/4", wastePercent: "lots" });
    expect(res.status).toBe(422);
    expect(Object.keys(res.json.fields ?? {}).sort()).toEqual(["kerf", "trimDefaults.casingThickness", "trimDefaults.reveal", "wastePercent"]);
    expect(await snapshot()).toBe(before);
  });

  it.each([3 / 32, 5 / 32, 15 / 64, 2.5 * (5 / 127)])("a kerf of %d survives store → show → save untouched", async (kerf) => {
    expect((await patch({ kerf })).status).toBe(200);
    const read = async () => (await call(settingsRoute.GET, { method: "GET", path: "/x", params: { orgSlug: home.org.slug }, cookie: await cookieOf("admin") })).json.settings as { kerf: number; wastePercent: number };
    const stored = await read();
    expect(stored.kerf).toBe(kerf);
    // What the settings form shows in the kerf field, sent back as typed text.
    const shown = formatLengthExact(stored.kerf).replace(/"$/, "");
    expect((await patch({ kerf: shown, wastePercent: stored.wastePercent })).status).toBe(200);
    expect((await read()).kerf).toBe(kerf);
  });

  it("new window types start from the company's trim defaults, and takeoffs use its kerf and waste", async () => {
    const spec = { style: "picture-frame", casingWidth: 3.5, casingThickness: 0.75 };
    expect((await patch({ trimDefaults: spec, kerf: "3/32", wastePercent: 5 })).status).toBe(200);
    const cookie = await cookieOf("estimator");
    const params = { orgSlug: home.org.slug, projectId: home.project.id };
    const created = await call(openingTypesRoute.POST, { method: "POST", path: "/x", params, body: { mark: "W8", width: 30, height: 40, setback: 0 }, cookie });
    expect(created.json.openingType).toMatchObject({ trimSpec: spec });
    const { priceBookId } = await addTestPriceBook(home.org.id);
    const run = await call(takeoffsRoute.POST, { method: "POST", path: "/x", params, body: { name: "With our settings", priceBookId }, cookie });
    // No rip kerf set: the engine rips with the saw kerf; the time limit is the default, written down.
    expect((run.json.takeoff as TakeoffView).inputs.settings).toEqual({ kerf: 3 / 32, wastePercent: 5, planSeconds: 2, scarfOverlap: 1 });
  });
});

describe("rip kerf and board-order time limit", () => {
  const read = async (actor: Actor = "admin") =>
    (await call(settingsRoute.GET, { method: "GET", path: "/x", params: { orgSlug: home.org.slug }, cookie: await cookieOf(actor) })).json.settings as {
      kerf: number;
      ripKerf: number | null;
      planSeconds: number;
    };

  it("until set, rips take the saw kerf (null) and the time limit is 2 s", async () => {
    expect(await read()).toMatchObject({ ripKerf: null, planSeconds: 2 });
  });

  it.each([
    ["admin", 200],
    ["estimator", 403],
    ["project_manager", 403],
    ["outsider", 404],
    ["anonymous", 401],
  ] as const)("%s changing them → %i", async (actor, status) => {
    const before = await snapshot();
    expect((await patch({ ripKerf: "3/32", planSeconds: 10 }, actor)).status).toBe(status);
    if (status !== 200) expect(await snapshot()).toBe(before);
    else expect(await read()).toMatchObject({ ripKerf: 3 / 32, planSeconds: 10 });
  });

  it.each([
    [{ ripKerf: "3/4" }, "ripKerf", /Rip kerf must be at most 1\/2 in/],
    [{ ripKerf: "thin" }, "ripKerf", /Rip kerf: write a length/],
    [{ ripKerf: -0.125 }, "ripKerf", /Rip kerf must be zero or more/],
    [{ planSeconds: 0.25 }, "planSeconds", /at least 0.5 seconds/],
    [{ planSeconds: 61 }, "planSeconds", /at most 60 seconds/],
    [{ planSeconds: "soon" }, "planSeconds", /must be a number of seconds/],
  ])("refuses %j naming %s, changing nothing", async (body, field, message) => {
    expect((await patch({ ripKerf: "1/8", planSeconds: 4 })).status).toBe(200);
    const before = await snapshot();
    const res = await patch(body);
    expect(res.status).toBe(422);
    expect(res.json.fields?.[field]).toMatch(message);
    expect(await snapshot()).toBe(before);
    expect(await read()).toMatchObject({ ripKerf: 1 / 8, planSeconds: 4 });
  });

  it("a zero rip kerf is kept as zero, blank goes back to the saw kerf, and other changes leave both alone", async () => {
    expect((await patch({ ripKerf: "0", planSeconds: "0.5" })).status).toBe(200);
    expect(await read()).toMatchObject({ ripKerf: 0, planSeconds: 0.5 });
    expect((await patch({ wastePercent: 12, kerf: "1/8" })).status).toBe(200);
    expect(await read()).toMatchObject({ ripKerf: 0, planSeconds: 0.5 });
    expect((await patch({ ripKerf: "", planSeconds: null })).status).toBe(200);
    expect(await read()).toMatchObject({ ripKerf: null, planSeconds: 2 });
  });

  it("every takeoff run copies them into its inputs", async () => {
    expect((await patch({ kerf: "1/8", ripKerf: "5/32", planSeconds: 0.5 })).status).toBe(200);
    const params = { orgSlug: home.org.slug, projectId: home.project.id };
    const cookie = await cookieOf("estimator");
    await call(openingTypesRoute.POST, { method: "POST", path: "/x", params, body: { mark: "W9", width: 30, height: 40, setback: 1.25 }, cookie });
    const { priceBookId } = await addTestPriceBook(home.org.id);
    const run = await call(takeoffsRoute.POST, { method: "POST", path: "/x", params, body: { name: "Ripped", priceBookId }, cookie });
    expect(run.status).toBe(201);
    expect((run.json.takeoff as TakeoffView).inputs.settings).toEqual({ kerf: 1 / 8, wastePercent: 10, ripKerf: 5 / 32, planSeconds: 0.5, scarfOverlap: 1 });
  });
});

describe("scarf overlap", () => {
  const read = async () =>
    (await call(settingsRoute.GET, { method: "GET", path: "/x", params: { orgSlug: home.org.slug }, cookie: await cookieOf("admin") })).json.settings as { scarfOverlap: number };

  it("is 1 in until set, is kept when set, and blank goes back to 1 in", async () => {
    expect((await patch({ scarfOverlap: null })).status).toBe(200);
    expect((await read()).scarfOverlap).toBe(1);
    expect((await patch({ scarfOverlap: "1 1/2" })).status).toBe(200);
    expect((await read()).scarfOverlap).toBe(1.5);
    expect((await patch({ wastePercent: 10 })).status).toBe(200);
    expect((await read()).scarfOverlap).toBe(1.5);
    expect((await patch({ scarfOverlap: "" })).status).toBe(200);
    expect((await read()).scarfOverlap).toBe(1);
  });

  it.each([
    [{ scarfOverlap: "long" }, /Scarf overlap: write a length such as 1, 3\/4 or 20 mm/],
    [{ scarfOverlap: "13" }, /at most 12 in/],
  ])("refuses %j on its field, changing nothing", async (body, message) => {
    const before = await snapshot();
    const res = await patch(body);
    expect(res.status).toBe(422);
    expect(res.json.fields?.scarfOverlap).toMatch(message);
    expect(await snapshot()).toBe(before);
  });

  it("an estimator cannot change it", async () => {
    const before = await snapshot();
    expect((await patch({ scarfOverlap: "2" }, "estimator")).status).toBe(403);
    expect(await snapshot()).toBe(before);
  });
});
