import { describe, expect, it } from "vitest";
import * as projectsRoute from "@/app/api/orgs/[orgSlug]/projects/route";
import * as projectRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/route";
import { call, sessionCookie } from "./helpers/http";
import { snapshot } from "./helpers/snapshot";
import { makeOrg } from "./helpers/world";

describe("projects", () => {
  it("are created, renamed, given a contractor and due date, archived and restored", async () => {
    const w = await makeOrg("Tamarack");
    const cookie = await sessionCookie(w.people.estimator);
    const params = { orgSlug: w.org.slug };
    const created = await call(projectsRoute.POST, { method: "POST", path: "/api/x", params, body: { name: "Bellwether Flats" }, cookie });
    expect(created.status).toBe(201);
    const id = (created.json.project as { id: string }).id;
    const patch = (body: unknown) =>
      call(projectRoute.PATCH, { method: "PATCH", path: "/api/x", params: { ...params, projectId: id }, body, cookie });

    const edited = await patch({ name: "Bellwether Flats — Phase 2", generalContractor: "Copperline GC", bidDue: "2027-04-01" });
    expect(edited.json.project).toMatchObject({ name: "Bellwether Flats — Phase 2", generalContractor: "Copperline GC", bidDue: "2027-04-01", status: "draft", submittedTakeoff: null });

    expect((await patch({ archived: true })).status).toBe(200);
    const listed = await call(projectsRoute.GET, { method: "GET", path: "/api/x", params, cookie });
    expect((listed.json.projects as { id: string }[]).map((p) => p.id)).not.toContain(id);
    const all = await call(projectsRoute.GET, { method: "GET", path: "/api/x?archived=include", params, cookie });
    expect((all.json.projects as { id: string }[]).map((p) => p.id)).toContain(id);

    const restored = await patch({ archived: false });
    expect(restored.json.project).toMatchObject({ archivedAt: null });
  });

  const bad: [string, unknown, string, RegExp][] = [
    ["an overlong name", { name: "x".repeat(161) }, "name", /at most 160/],
    ["an empty name", { name: "  " }, "name", /required/],
    ["an impossible date", { bidDue: "2027-02-30" }, "bidDue", /date/],
    ["an unknown status", { status: "pending" }, "status", /draft, submitted, won or lost/],
    ["an unknown field", { orgId: "00000000-0000-0000-0000-000000000000" }, "_", /Unrecognized key|orgId/],
    ["nothing at all", {}, "_", /Nothing to change/],
  ];
  it.each(bad)("refuses %s with a field message and writes nothing", async (_label, body, field, message) => {
    const w = await makeOrg("Tamarack");
    const before = await snapshot();
    const res = await call(projectRoute.PATCH, {
      method: "PATCH",
      path: "/api/x",
      params: { orgSlug: w.org.slug, projectId: w.project.id },
      body,
      cookie: await sessionCookie(w.people.admin),
    });
    expect(res.status).toBe(422);
    expect(res.json.fields?.[field]).toMatch(message);
    expect(await snapshot()).toBe(before);
  });

  // Moved here with the new-project form, which now posts to this route (the server action it used is gone).
  it.each([
    ["admin", 201],
    ["estimator", 201],
    ["project_manager", 403],
  ] as const)("creating a project as %s answers %i, naming the project when it is made", async (role, status) => {
    const w = await makeOrg("Tamarack");
    const before = await snapshot();
    const res = await call(projectsRoute.POST, { method: "POST", path: "/api/x", params: { orgSlug: w.org.slug }, body: { name: "Wren Court" }, cookie: await sessionCookie(w.people[role]) });
    expect(res.status).toBe(status);
    if (status === 201) expect(res.json.project).toMatchObject({ name: "Wren Court", generalContractor: null, bidDue: null, status: "draft" });
    else expect(await snapshot()).toBe(before);
  });

  it("refuses a new project's bad fields all at once, as the form sends them, and writes nothing", async () => {
    const w = await makeOrg("Tamarack");
    const before = await snapshot();
    const res = await call(projectsRoute.POST, {
      method: "POST",
      path: "/api/x",
      params: { orgSlug: w.org.slug },
      // Empty inputs come as "", exactly as the form posts them.
      body: { name: "x".repeat(161), generalContractor: "", bidDue: "31/02/2027" },
      cookie: await sessionCookie(w.people.estimator),
    });
    expect(res.status).toBe(422);
    expect(res.json.fields).toEqual({
      name: "Project name must be at most 160 characters.",
      bidDue: "Bid due date must be a date (YYYY-MM-DD).",
    });
    expect(await snapshot()).toBe(before);
  });

  it("takes a new project's empty optional fields as none", async () => {
    const w = await makeOrg("Tamarack");
    const res = await call(projectsRoute.POST, { method: "POST", path: "/api/x", params: { orgSlug: w.org.slug }, body: { name: "Wren Court", generalContractor: "", bidDue: "" }, cookie: await sessionCookie(w.people.estimator) });
    expect(res.status).toBe(201);
    expect(res.json.project).toMatchObject({ generalContractor: null, bidDue: null });
  });

  it("a malformed project id or an unknown org slug is a 404, never a 500", async () => {
    const w = await makeOrg("Tamarack");
    const cookie = await sessionCookie(w.people.admin);
    const badId = await call(projectRoute.GET, { method: "GET", path: "/api/x", params: { orgSlug: w.org.slug, projectId: "1; drop table projects" }, cookie });
    expect(badId.status).toBe(404);
    const badSlug = await call(projectsRoute.GET, { method: "GET", path: "/api/x", params: { orgSlug: "no-such-org-anywhere" }, cookie });
    expect(badSlug.status).toBe(404);
  });

  it("a body that is not JSON is a 400", async () => {
    const w = await makeOrg("Tamarack");
    const res = await call(projectsRoute.POST, {
      method: "POST",
      path: "/api/x",
      params: { orgSlug: w.org.slug },
      rawBody: "name=Hello",
      cookie: await sessionCookie(w.people.admin),
    });
    expect(res.status).toBe(400);
  });

  it("stores SQL and HTML in text fields verbatim", async () => {
    const w = await makeOrg("Tamarack");
    const name = `Robert'); DROP TABLE projects;-- <script>alert(1)</script>`;
    const res = await call(projectsRoute.POST, {
      method: "POST",
      path: "/api/x",
      params: { orgSlug: w.org.slug },
      body: { name, generalContractor: `<img src=x onerror=alert(2)>` },
      cookie: await sessionCookie(w.people.admin),
    });
    expect(res.status).toBe(201);
    expect(res.json.project).toMatchObject({ name, generalContractor: `<img src=x onerror=alert(2)>` });
  });
});
