import { and, eq } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import * as takeoffsRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/takeoffs/route";
import * as submitRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/takeoffs/[takeoffId]/submit/route";
import * as projectRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/route";
import { db } from "@/db/client";
import { takeoffs } from "@/db/schema";
import type { TakeoffView } from "@/lib/server/takeoffs/takeoffs";
import { call, sessionCookie } from "./helpers/http";
import { snapshot } from "./helpers/snapshot";
import { addTestPriceBook } from "./helpers/takeoff-world";
import { makeOrg, type World } from "./helpers/world";

let home: World;
let first: TakeoffView;
let second: TakeoffView;

const projectParams = () => ({ orgSlug: home.org.slug, projectId: home.project.id });
const submit = async (t: TakeoffView) =>
  call(submitRoute.POST, { method: "POST", path: "/x", params: { ...projectParams(), takeoffId: t.id }, cookie: await sessionCookie(home.people.project_manager) });
const setStatus = async (status: string) =>
  call(projectRoute.PATCH, { method: "PATCH", path: "/x", params: projectParams(), body: { status }, cookie: await sessionCookie(home.people.admin) });
const submittedIds = async () =>
  (await db.select({ id: takeoffs.id }).from(takeoffs).where(and(eq(takeoffs.projectId, home.project.id), eq(takeoffs.status, "submitted")))).map((r) => r.id);

beforeEach(async () => {
  home = await makeOrg("Quillan");
  const { priceBookId } = await addTestPriceBook(home.org.id);
  const run = async (name: string) =>
    (await call(takeoffsRoute.POST, { method: "POST", path: "/x", params: projectParams(), body: { name, priceBookId }, cookie: await sessionCookie(home.people.estimator) })).json
      .takeoff as TakeoffView;
  first = await run("Base bid");
  second = await run("Alternate with oak");
});

describe("one submitted takeoff per project", () => {
  it("refuses to submit a second takeoff, naming the one that is the bid, and changes nothing", async () => {
    expect((await submit(first)).status).toBe(200);
    const before = await snapshot();
    const res = await submit(second);
    expect(res.status).toBe(409);
    expect(res.json.error).toMatch(/"Base bid" is already this project's submitted bid/);
    expect(await snapshot()).toBe(before);
    expect(await submittedIds()).toEqual([first.id]);
  });

  it("two submits at the same moment: one wins, the other is told so", async () => {
    const answers = await Promise.all([submit(first), submit(second)]);
    expect(answers.map((a) => a.status).sort()).toEqual([200, 409]);
    const loser = answers.find((a) => a.status === 409)!;
    expect(loser.json.error).toMatch(/already this project's submitted bid/);
    expect(await submittedIds()).toHaveLength(1);
  });

  it("the database itself refuses a second submitted takeoff (partial unique index)", async () => {
    await db.update(takeoffs).set({ status: "submitted" }).where(eq(takeoffs.id, first.id));
    await expect(db.update(takeoffs).set({ status: "submitted" }).where(eq(takeoffs.id, second.id))).rejects.toMatchObject({
      cause: { code: "23505", constraint: "takeoffs_one_submitted_per_project" },
    });
  });
});

describe("the project's status follows from its takeoffs", () => {
  it("cannot be marked submitted, won or lost before a takeoff is submitted", async () => {
    for (const status of ["submitted", "won", "lost"]) {
      const before = await snapshot();
      const res = await setStatus(status);
      expect(res.status).toBe(422);
      expect(res.json.fields?.status).toMatch(/Submit one of the project's takeoffs first/);
      expect(await snapshot()).toBe(before);
    }
  });

  it("reads submitted with the bid named, moves to won or lost by hand, and never back to draft", async () => {
    expect((await submit(first)).status).toBe(200);
    const read = await call(projectRoute.GET, { method: "GET", path: "/x", params: projectParams(), cookie: await sessionCookie(home.people.project_manager) });
    expect(read.json.project).toMatchObject({ status: "submitted", submittedTakeoff: { id: first.id, name: "Base bid" } });

    const before = await snapshot();
    const back = await setStatus("draft");
    expect(back.status).toBe(422);
    expect(back.json.fields?.status).toMatch(/"Base bid" is submitted as the bid/);
    expect(await snapshot()).toBe(before);

    expect((await setStatus("won")).json.project).toMatchObject({ status: "won" });
    expect((await setStatus("submitted")).json.project).toMatchObject({ status: "submitted" });
  });
});
