/**
 * Opening kinds through the API: each kind is stored with its own fields, refused with the field named
 * when one is wrong or missing, and a takeoff runs with every kind at once.
 */
import { beforeEach, describe, expect, it } from "vitest";
import * as takeoffsRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/takeoffs/route";
import * as openingTypesRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/opening-types/route";
import * as openingTypeRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/opening-types/[openingTypeId]/route";
import type { TakeoffView } from "@/lib/server/takeoffs/takeoffs";
import type { OpeningTypeView } from "@/lib/plans/api-types";
import { addTag as createTag } from "@/lib/server/plans/tags";
import { call, sessionCookie } from "./helpers/http";
import { snapshot } from "./helpers/snapshot";
import { addTestPriceBook } from "./helpers/takeoff-world";
import { makeOrg, type World } from "./helpers/world";

let w: World;
beforeEach(async () => {
  w = await makeOrg("Wrenfold");
});
const params = () => ({ orgSlug: w.org.slug, projectId: w.project.id });
const create = async (body: Record<string, unknown>, who: keyof World["people"] = "estimator") =>
  call(openingTypesRoute.POST, { method: "POST", path: "/x", params: params(), body, cookie: await sessionCookie(w.people[who]) });
const spec = { style: "stool-and-apron", casingWidth: 2.5, casingThickness: 0.6875 };

const KINDS = [
  { mark: "M2", kind: "mulled", widths: ["35 1/2", "35 1/2"], mullGap: "1 1/2", height: "4'-6\"", setback: "1 7/16", trimSpec: spec },
  { mark: "D1", kind: "door", width: "30", height: "81", sides: 2, trimSpec: spec },
  { mark: "D2", kind: "door", width: "36", height: "80", sides: "1", trimSpec: spec },
  { mark: "R1", kind: "round-top", width: "48", springHeight: "36", setback: "1 7/16", trimSpec: spec },
  { mark: "S1", kind: "segment-top", width: "48", springHeight: "36", rise: "8", setback: "1 7/16", trimSpec: spec },
  { mark: "B1", kind: "bay", widths: ["24", "48", "24"], mullGap: "3", turn: 45, height: "54", setback: "1 7/16", trimSpec: spec },
];

describe("opening kinds", () => {
  it("stores each kind with its own fields and its overall size", async () => {
    const made: Record<string, OpeningTypeView> = {};
    for (const body of KINDS) {
      const res = await create(body);
      expect(res.status, `${body.mark}: ${JSON.stringify(res.json)}`).toBe(201);
      made[body.mark] = res.json.openingType as OpeningTypeView;
    }
    // Overall sizes, derived: a mulled pair spans 35 1/2 + 1 1/2 + 35 1/2; a half-round adds its radius to the spring height.
    expect(made.M2).toMatchObject({ kind: "mulled", width: 72.5, height: 54, shape: { widths: [35.5, 35.5], mullGap: 1.5 } });
    expect(made.D1).toMatchObject({ kind: "door", width: 30, height: 81, setback: 0, shape: { sides: 2 } });
    expect(made.D2).toMatchObject({ shape: { sides: 1 } });
    expect(made.R1).toMatchObject({ kind: "round-top", width: 48, height: 36 + 24, shape: { springHeight: 36 } });
    expect(made.S1).toMatchObject({ height: 44, shape: { springHeight: 36, rise: 8 } });
    expect(made.B1).toMatchObject({ kind: "bay", width: 24 + 48 + 24 + 2 * 3, shape: { widths: [24, 48, 24], mullGap: 3, turn: 45 } });
  });

  it.each([
    ["one unit in a mulled opening", { ...KINDS[0], widths: ["35"] }, "widths", /at least two windows/],
    ["a mull gap no wider than two reveals", { ...KINDS[0], mullGap: "1/4" }, "mullGap", /./],
    ["a door cased on three sides", { ...KINDS[1], sides: 3 }, "sides", /1 \(exterior\) or 2 \(interior\)/],
    ["a round-top without its spring height", { ...KINDS[3], springHeight: undefined }, "springHeight", /spring height/],
    ["a bay of two units", { ...KINDS[5], widths: ["24", "24"] }, "widths", /at least three units/],
    ["an unknown kind", { ...KINDS[0], kind: "porthole" }, "kind", /Kind must be one of/],
    ["a door's field on a window", { mark: "W9", width: "30", height: "40", setback: "1", sides: 2 }, "sides", /has no sides/],
  ])("refuses %s with 422 naming the field, writing nothing", async (_, body, field, message) => {
    const before = await snapshot();
    const res = await create(body as Record<string, unknown>);
    expect(res.status).toBe(422);
    expect(res.json.fields?.[field]).toMatch(message);
    expect(await snapshot()).toBe(before);
  });

  it("a project manager reads the kinds but cannot add one; another company's estimator finds no project", async () => {
    expect((await create(KINDS[1]!, "project_manager")).status).toBe(403);
    const other = await makeOrg("Other");
    const res = await call(openingTypesRoute.POST, { method: "POST", path: "/x", params: params(), body: KINDS[1], cookie: await sessionCookie(other.people.estimator) });
    expect(res.status).toBe(404);
  });

  it("changing a window into a mulled unit replaces its size with the units' span", async () => {
    const first = await create({ mark: "W7", width: "36", height: "60", setback: "1", trimSpec: spec });
    expect(first.status, JSON.stringify(first.json)).toBe(201);
    const made = first.json.openingType as OpeningTypeView;
    const res = await call(openingTypeRoute.PATCH, {
      method: "PATCH",
      path: "/x",
      params: { ...params(), openingTypeId: made.id },
      body: { version: made.version, kind: "mulled", widths: ["36", "36"], mullGap: "2" },
      cookie: await sessionCookie(w.people.estimator),
    });
    expect(res.status).toBe(200);
    expect(res.json.openingType).toMatchObject({ kind: "mulled", width: 74, height: 60, shape: { widths: [36, 36], mullGap: 2 } });
  });

  it("a takeoff runs with every kind at once: the snapshot keeps kind and fields, doors get no stool", async () => {
    const { priceBookId } = await addTestPriceBook(w.org.id);
    const scope = { orgId: w.org.id, projectId: w.project.id, userId: w.people.estimator.id };
    for (const body of KINDS) {
      const ot = (await create(body)).json.openingType as OpeningTypeView;
      await createTag(scope, { sheetId: w.plans.commonSheet.id, openingTypeId: ot.id, x: 50, y: 50 });
    }
    const run = await call(takeoffsRoute.POST, {
      method: "POST",
      path: "/x",
      params: params(),
      body: { name: "Every kind", priceBookId, allowPlaceholders: true },
      cookie: await sessionCookie(w.people.estimator),
    });
    expect(run.status, JSON.stringify(run.json)).toBe(201);
    const t = run.json.takeoff as TakeoffView;
    const inputOf = (mark: string) => t.inputs.openingTypes.find((o) => o.mark === mark)!;
    expect(inputOf("M2")).toMatchObject({ kind: "mulled", shape: { widths: [35.5, 35.5], mullGap: 1.5 } });
    expect(inputOf("D1")).toMatchObject({ kind: "door", shape: { sides: 2 } });
    const resultOf = (mark: string) => t.result.openingTypes.find((o) => o.mark === mark)!;
    expect(resultOf("D1").cutList.map((p) => p.material)).toEqual(expect.arrayContaining(["casing"]));
    expect(resultOf("D1").cutList.some((p) => p.material === "stool")).toBe(false);
    expect(resultOf("R1").cutList.some((p) => p.part === "casing-arch" && p.radius === 24 + 0.125)).toBe(true);
    expect(resultOf("M2").cutList.some((p) => p.part === "mullion-casing")).toBe(true);
    expect(resultOf("B1").kindOpening).toMatchObject({ kind: "bay", turn: 45 });
    expect(t.result.orders.some((o) => o.material === "mullion")).toBe(true);
  });
});
