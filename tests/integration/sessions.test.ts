/**
 * Sessions end when they should: a cookie copied before sign-out, or before its owner was removed from an
 * organisation, stops working on the very read that loads the caller's membership.
 */
import { describe, expect, it } from "vitest";
import * as memberRoute from "@/app/api/orgs/[orgSlug]/members/[memberId]/route";
import * as projectsRoute from "@/app/api/orgs/[orgSlug]/projects/route";
import { getSessionUser } from "@/db/queries/users";
import { authOptions, authorizeCredentials } from "@/lib/auth/options";
import { call, sessionCookie } from "./helpers/http";
import { makeOrg, PASSWORD, unique } from "./helpers/world";

const listProjects = (orgSlug: string, cookie: string) => call(projectsRoute.GET, { method: "GET", path: "/api/x", params: { orgSlug }, cookie });

describe("sessions", () => {
  it("signing out ends the session: a copied cookie no longer works", async () => {
    const w = await makeOrg("Larchmont");
    const me = w.people.estimator;
    const copied = await sessionCookie(me);
    expect((await listProjects(w.org.slug, copied)).status).toBe(200);
    // What next-auth runs on POST /api/auth/signout, with the token of the cookie being signed out.
    await authOptions.events!.signOut!({ token: { sub: me.id }, session: null as never });
    expect((await listProjects(w.org.slug, copied)).status).toBe(401);
    // A new sign-in issues a cookie under the new version, which works.
    const user = await authorizeCredentials({ email: me.email, password: PASSWORD }, `192.0.2.${unique().slice(0, 2)}`);
    expect((await listProjects(w.org.slug, await sessionCookie(me, user.sessionVersion))).status).toBe(200);
    expect(await getSessionUser({ userId: me.id, sessionVersion: user.sessionVersion - 1 })).toBeNull();
    expect(await getSessionUser({ userId: me.id, sessionVersion: user.sessionVersion })).toMatchObject({ id: me.id });
  });

  it("being removed from an organisation ends the person's sessions", async () => {
    const w = await makeOrg("Larchmont");
    const removed = w.people.project_manager;
    const copied = await sessionCookie(removed);
    expect((await listProjects(w.org.slug, copied)).status).toBe(200);
    const res = await call(memberRoute.DELETE, {
      method: "DELETE",
      path: "/api/x",
      params: { orgSlug: w.org.slug, memberId: removed.membershipId },
      cookie: await sessionCookie(w.people.admin),
    });
    expect(res.status).toBeLessThan(300);
    expect((await listProjects(w.org.slug, copied)).status).toBe(401);
  });

  it("a cookie without a session version (issued before versions existed) is not a session", async () => {
    const w = await makeOrg("Larchmont");
    const { encode } = await import("next-auth/jwt");
    const { env } = await import("@/lib/env");
    const me = w.people.admin;
    const jwt = await encode({ token: { sub: me.id, name: me.name, email: me.email }, secret: env.NEXTAUTH_SECRET });
    expect((await listProjects(w.org.slug, `next-auth.session-token=${jwt}`)).status).toBe(401);
  });
});
