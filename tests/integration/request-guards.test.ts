/**
 * What every request passes before a handler runs: the same-origin check on writes (CSRF), the exact JSON
 * media type, strict fields, and the inputs that used to answer 500 — each a 4xx with a message that
 * changes nothing.
 */
import { describe, expect, it } from "vitest";
import { NextRequest } from "next/server";
import * as projectsRoute from "@/app/api/orgs/[orgSlug]/projects/route";
import * as tagRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/tags/[tagId]/route";
import * as itemsRoute from "@/app/api/orgs/[orgSlug]/price-books/[priceBookId]/items/route";
import * as memberRoute from "@/app/api/orgs/[orgSlug]/members/[memberId]/route";
import * as signupRoute from "@/app/api/signup/route";
import { env } from "@/lib/env";
import { call, sessionCookie } from "./helpers/http";
import { snapshot } from "./helpers/snapshot";
import { makeOrg, unique } from "./helpers/world";

function send(headers: Record<string, string>, body: unknown, cookie: string | undefined, method = "POST") {
  const h = new Headers(headers);
  if (cookie) h.set("cookie", cookie);
  return new NextRequest(new URL("/api/x", env.NEXTAUTH_URL), { method, headers: h, body: JSON.stringify(body) });
}

describe("writes from another site are refused (CSRF)", () => {
  it.each([
    ["Sec-Fetch-Site: cross-site", { "sec-fetch-site": "cross-site" }],
    ["Sec-Fetch-Site: same-site (a sibling subdomain)", { "sec-fetch-site": "same-site" }],
    ["a foreign Origin", { origin: "https://trim.example.test" }],
    ["Origin: null (a sandboxed frame)", { origin: "null" }],
  ])("%s → 403, nothing written", async (_label, extra) => {
    const w = await makeOrg("Quince");
    const cookie = await sessionCookie(w.people.admin);
    const before = await snapshot();
    const res = await projectsRoute.POST(send({ "content-type": "application/json", ...extra }, { name: "Forged" }, cookie), {
      params: Promise.resolve({ orgSlug: w.org.slug }),
    });
    expect(res.status).toBe(403);
    expect(((await res.json()) as { error: string }).error).toMatch(/another site/);
    expect(await snapshot()).toBe(before);
  });

  it("the public routes check it too", async () => {
    const before = await snapshot();
    const body = { name: "Forged Person", email: `forged-${unique()}@example.test`, password: "long enough password", organisationName: "Forged Co" };
    const res = await signupRoute.POST(send({ "content-type": "application/json", "sec-fetch-site": "cross-site" }, body, undefined), {
      params: Promise.resolve({}),
    });
    expect(res.status).toBe(403);
    expect(await snapshot()).toBe(before);
  });

  it("the app's own pages may write (same-origin, with its Origin)", async () => {
    const w = await makeOrg("Quince");
    const cookie = await sessionCookie(w.people.admin);
    const res = await projectsRoute.POST(
      send({ "content-type": "application/json", "sec-fetch-site": "same-origin", origin: new URL(env.NEXTAUTH_URL).origin }, { name: `Own ${unique()}` }, cookie),
      { params: Promise.resolve({ orgSlug: w.org.slug }) },
    );
    expect(res.status).toBe(201);
  });

  it("a 'simple' content type that merely mentions JSON → 415, nothing written", async () => {
    const w = await makeOrg("Quince");
    const cookie = await sessionCookie(w.people.admin);
    const before = await snapshot();
    const res = await projectsRoute.POST(send({ "content-type": "text/plain; x=application/json" }, { name: "Forged" }, cookie), {
      params: Promise.resolve({ orgSlug: w.org.slug }),
    });
    expect(res.status).toBe(415);
    expect(await snapshot()).toBe(before);
  });
});

describe("inputs that used to answer 500", () => {
  it("a NUL in the organisation slug → 404 on reads and writes", async () => {
    const w = await makeOrg("Quince");
    const cookie = await sessionCookie(w.people.admin);
    for (const orgSlug of ["\u0000", `${w.org.slug}\u0000`, "a\u0000b"]) {
      expect((await call(projectsRoute.GET, { method: "GET", path: "/x", params: { orgSlug }, cookie })).status).toBe(404);
      expect((await call(projectsRoute.POST, { method: "POST", path: "/x", params: { orgSlug }, body: { name: "X" }, cookie })).status).toBe(404);
    }
  });

  it("a version beyond PostgreSQL's integer → 422 on PATCH and DELETE, nothing changed", async () => {
    const w = await makeOrg("Quince");
    const cookie = await sessionCookie(w.people.estimator);
    const params = { orgSlug: w.org.slug, projectId: w.project.id, tagId: w.plans.tag.id };
    const before = await snapshot();
    const patch = await call(tagRoute.PATCH, { method: "PATCH", path: "/x", params, body: { version: 2 ** 31, x: 1, y: 2 }, cookie });
    expect(patch.status).toBe(422);
    expect(patch.json.fields).toHaveProperty("version");
    const del = await call(tagRoute.DELETE, { method: "DELETE", path: `/x?version=${2 ** 31}`, params, cookie });
    expect(del.status).toBe(422);
    expect(await snapshot()).toBe(before);
  });

  it("half a UTF-16 surrogate pair in price-book item text → 422 naming the field, nothing changed", async () => {
    const w = await makeOrg("Quince");
    const cookie = await sessionCookie(w.people.admin);
    const before = await snapshot();
    const res = await call(itemsRoute.POST, {
      method: "POST",
      path: "/x",
      params: { orgSlug: w.org.slug, priceBookId: w.priceBook.book.id },
      body: { name: "Apron \uD800", kind: "apron", faceWidth: "3 1/2", thickness: "11/16", stock: [{ length: "8'", price: "12.40" }] },
      cookie,
    });
    expect(res.status).toBe(422);
    expect(res.json.fields).toHaveProperty("name");
    expect(await snapshot()).toBe(before);
  });
});

describe("unknown fields are refused, not dropped", () => {
  it.each([
    ["create project", { name: "Alder", orgId: "00000000-0000-0000-0000-000000000000" }, "orgId"],
    ["create project", { name: "Alder", createdBy: "someone" }, "createdBy"],
  ])("%s with %j → 422 naming %s", async (_route, body, field) => {
    const w = await makeOrg("Quince");
    const cookie = await sessionCookie(w.people.admin);
    const before = await snapshot();
    const res = await call(projectsRoute.POST, { method: "POST", path: "/x", params: { orgSlug: w.org.slug }, body, cookie });
    expect(res.status).toBe(422);
    expect(res.json.fields).toHaveProperty(field);
    expect(res.json.error).toMatch(field);
    expect(await snapshot()).toBe(before);
  });

  it("change a role with an extra orgId → 422, the role unchanged", async () => {
    const w = await makeOrg("Quince");
    const cookie = await sessionCookie(w.people.admin);
    const before = await snapshot();
    const res = await call(memberRoute.PATCH, {
      method: "PATCH",
      path: "/x",
      params: { orgSlug: w.org.slug, memberId: w.spare.membershipId },
      body: { role: "admin", orgId: "00000000-0000-0000-0000-000000000000" },
      cookie,
    });
    expect(res.status).toBe(422);
    expect(res.json.fields).toHaveProperty("orgId");
    expect(await snapshot()).toBe(before);
  });
});
