import { describe, expect, it } from "vitest";
import * as unitTypeRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/unit-types/[unitTypeId]/route";
import * as unitTypesRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/unit-types/route";
import type { UnitTypeView } from "@/lib/plans/api-types";
import { call, sessionCookie } from "./helpers/http";
import { snapshot } from "./helpers/snapshot";
import { makeOrg, type World } from "./helpers/world";

async function as(w: World) {
  const cookie = await sessionCookie(w.people.estimator);
  const base = { orgSlug: w.org.slug, projectId: w.project.id };
  const one = { ...base, unitTypeId: w.plans.unitType.id };
  return {
    list: async () => (await call(unitTypesRoute.GET, { method: "GET", path: "/x", params: base, cookie })).json.unitTypes as UnitTypeView[],
    patch: (body: unknown) => call(unitTypeRoute.PATCH, { method: "PATCH", path: "/x", params: one, body, cookie }),
    remove: (version?: number) =>
      call(unitTypeRoute.DELETE, { method: "DELETE", path: version === undefined ? "/x" : `/x?version=${version}`, params: one, cookie }),
  };
}

describe("unit types: optimistic concurrency", () => {
  it("two edits from the same version: one is saved, the other answers 409 with the row as it is now", async () => {
    const w = await makeOrg("Hawthorn");
    const api = await as(w);
    const [start] = await api.list();
    expect(start).toMatchObject({ id: w.plans.unitType.id, version: 1 });

    const [a, b] = await Promise.all([api.patch({ version: 1, count: 30 }), api.patch({ version: 1, count: 41 })]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const saved = (a.status === 200 ? a : b).json.unitType as UnitTypeView;
    const refused = a.status === 409 ? a : b;
    expect(saved.version).toBe(2);
    expect(refused.json.current).toEqual(saved);
    expect((await api.list()).find((u) => u.id === saved.id)).toEqual(saved);
  });

  it("an edit without a version is refused and changes nothing", async () => {
    const w = await makeOrg("Hawthorn");
    const api = await as(w);
    const before = await snapshot();
    const res = await api.patch({ count: 30 });
    expect(res.status).toBe(422);
    expect(res.json.fields).toHaveProperty("version");
    expect(await snapshot()).toBe(before);
  });

  it("a delete names the version it saw: stale → 409, current → 204", async () => {
    const w = await makeOrg("Hawthorn");
    const api = await as(w);
    expect((await api.patch({ version: 1, name: "Type A1" })).status).toBe(200);
    const before = await snapshot();
    expect((await api.remove()).status).toBe(422);
    const stale = await api.remove(1);
    expect(stale.status).toBe(409);
    expect(stale.json.current).toMatchObject({ name: "Type A1", version: 2 });
    expect(await snapshot()).toBe(before);
    expect((await api.remove(2)).status).toBe(204);
    expect((await api.remove(2)).status).toBe(404);
  });
});
