import { describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { memberships } from "@/db/schema";
import * as memberRoute from "@/app/api/orgs/[orgSlug]/members/[memberId]/route";
import * as projectsRoute from "@/app/api/orgs/[orgSlug]/projects/route";
import { call, sessionCookie } from "./helpers/http";
import { snapshot } from "./helpers/snapshot";
import { addMember, makeOrg } from "./helpers/world";

const patchRole = async (w: Awaited<ReturnType<typeof makeOrg>>, memberId: string, role: string, as = w.people.admin) =>
  call(memberRoute.PATCH, {
    method: "PATCH",
    path: "/api/x",
    params: { orgSlug: w.org.slug, memberId },
    body: { role },
    cookie: await sessionCookie(as),
  });

describe("members", () => {
  it("the last admin cannot demote themselves", async () => {
    const w = await makeOrg("Bracken");
    const before = await snapshot();
    const res = await patchRole(w, w.people.admin.membershipId, "estimator");
    expect(res.status).toBe(409);
    expect(res.json.error).toMatch(/at least one admin/);
    expect(await snapshot()).toBe(before);
  });

  it("the last admin cannot be removed", async () => {
    const w = await makeOrg("Bracken");
    const before = await snapshot();
    const res = await call(memberRoute.DELETE, {
      method: "DELETE",
      path: "/api/x",
      params: { orgSlug: w.org.slug, memberId: w.people.admin.membershipId },
      cookie: await sessionCookie(w.people.admin),
    });
    expect(res.status).toBe(409);
    expect(await snapshot()).toBe(before);
  });

  it("with a second admin, the first may step down", async () => {
    const w = await makeOrg("Bracken");
    await addMember(w.org.id, "admin", "Second-Admin");
    expect((await patchRole(w, w.people.admin.membershipId, "estimator")).status).toBe(200);
  });

  it("two admins demoting each other at once leave one admin standing", async () => {
    const w = await makeOrg("Bracken");
    const second = await addMember(w.org.id, "admin", "Second-Admin");
    const results = await Promise.all([
      patchRole(w, second.membershipId, "estimator", w.people.admin),
      patchRole(w, w.people.admin.membershipId, "estimator", second),
    ]);
    // Whichever lands second is refused: 409 if it raced the lock, 403 if its sender was already demoted.
    expect(results.filter((r) => r.status === 200)).toHaveLength(1);
    const admins = await db.select().from(memberships).where(and(eq(memberships.orgId, w.org.id), eq(memberships.role, "admin")));
    expect(admins).toHaveLength(1);
  });

  it("a role change takes effect on the very next request", async () => {
    const w = await makeOrg("Bracken");
    const cookie = await sessionCookie(w.people.estimator);
    const create = () =>
      call(projectsRoute.POST, { method: "POST", path: "/api/x", params: { orgSlug: w.org.slug }, body: { name: "Kiln Street" }, cookie });
    expect((await create()).status).toBe(201);
    expect((await patchRole(w, w.people.estimator.membershipId, "project_manager")).status).toBe(200);
    expect((await create()).status).toBe(403);
  });

  it("a removed member loses the organisation at once: their session ends, and signed in again it is a 404", async () => {
    const w = await makeOrg("Bracken");
    const cookie = await sessionCookie(w.spare);
    const list = (c = cookie) => call(projectsRoute.GET, { method: "GET", path: "/api/x", params: { orgSlug: w.org.slug }, cookie: c });
    expect((await list()).status).toBe(200);
    const del = await call(memberRoute.DELETE, {
      method: "DELETE",
      path: "/api/x",
      params: { orgSlug: w.org.slug, memberId: w.spare.membershipId },
      cookie: await sessionCookie(w.people.admin),
    });
    expect(del.status).toBe(204);
    expect((await list()).status).toBe(401);
    expect((await list(await sessionCookie(w.spare))).status).toBe(404);
  });

  it("an unknown role is refused with a field message", async () => {
    const w = await makeOrg("Bracken");
    const res = await patchRole(w, w.spare.membershipId, "owner");
    expect(res.status).toBe(422);
    expect(res.json.fields?.role).toMatch(/admin, estimator or project manager/);
  });
});
