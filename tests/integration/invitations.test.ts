import { describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import * as invitationsRoute from "@/app/api/orgs/[orgSlug]/invitations/route";
import * as accept from "@/app/api/invitations/accept/route";
import { db } from "@/db/client";
import { invitations, memberships, organisations, users } from "@/db/schema";
import { readOutbox } from "@/lib/mail/outbox";
import { NextRequest } from "next/server";
import { env, outboxDir } from "@/lib/env";
import { authorizeCredentials } from "@/lib/auth/options";
import { call, sessionCookie } from "./helpers/http";
import { snapshot } from "./helpers/snapshot";
import { makeOrg, PASSWORD, unique } from "./helpers/world";

/** Sends an invitation through the API and returns the token from the e-mail the stand-in received. */
async function inviteByMail(email: string, role = "estimator") {
  const w = await makeOrg("Juniper");
  const res = await call(invitationsRoute.POST, {
    method: "POST",
    path: "/api/x",
    params: { orgSlug: w.org.slug },
    body: { email, role },
    cookie: await sessionCookie(w.people.admin),
  });
  expect(res.status).toBe(201);
  const message = (await readOutbox(outboxDir())).find((m) => m.to.includes(email.toLowerCase()));
  expect(message?.subject).toContain(w.org.name);
  const token = message!.text.match(/\/invite\/([A-Za-z0-9_-]+)/)![1]!;
  return { w, token };
}

const acceptWith = (body: Record<string, unknown>) => call(accept.POST, { method: "POST", path: "/api/invitations/accept", body });

describe("invitations", () => {
  it("an e-mailed link makes a new person a member with the invited role, and they can sign in", async () => {
    const email = `newcomer-${unique()}@example.test`;
    const { w, token } = await inviteByMail(email, "project_manager");
    const res = await acceptWith({ token, name: "Nell Brackett", password: "a fresh password" });
    expect(res.status).toBe(200);
    expect(res.json).toMatchObject({ orgSlug: w.org.slug, role: "project_manager" });
    const [user] = await db.select().from(users).where(eq(users.email, email));
    const [m] = await db.select().from(memberships).where(and(eq(memberships.userId, user!.id), eq(memberships.orgId, w.org.id)));
    expect(m?.role).toBe("project_manager");
    await expect(authorizeCredentials({ email, password: "a fresh password" }, "10.0.0.1")).resolves.toMatchObject({ email });
  });

  it("an existing account joins with its own password and keeps its other organisations", async () => {
    const first = await makeOrg("Alder");
    const person = first.people.estimator;
    const { w, token } = await inviteByMail(person.email, "admin");
    const wrong = await acceptWith({ token, password: "not the password" });
    expect(wrong.status).toBe(422);
    expect(wrong.json.fields?.password).toMatch(/Wrong password/);
    const res = await acceptWith({ token, password: PASSWORD });
    expect(res.status).toBe(200);
    const rows = await db.select({ orgId: memberships.orgId, role: memberships.role }).from(memberships).where(eq(memberships.userId, person.id));
    expect(rows).toEqual(expect.arrayContaining([{ orgId: first.org.id, role: "estimator" }, { orgId: w.org.id, role: "admin" }]));
  });

  it("the e-mail shows the inviter's and company's names as text, not markup", async () => {
    const w = await makeOrg("Sorrel");
    await db.update(organisations).set({ name: `<i>Sorrel</i> & Co` }).where(eq(organisations.id, w.org.id));
    const email = `markup-${unique()}@example.test`;
    await call(invitationsRoute.POST, {
      method: "POST",
      path: "/api/x",
      params: { orgSlug: w.org.slug },
      body: { email, role: "estimator" },
      cookie: await sessionCookie(w.people.admin),
    });
    const message = (await readOutbox(outboxDir())).find((m) => m.to.includes(email));
    expect(message?.html).toContain("&lt;i&gt;Sorrel&lt;/i&gt; &amp; Co");
  });

  describe("refusals, each with a clear message and no change", () => {
    const cases: [string, () => Promise<{ token: string; expectStatus: number; message: RegExp }>][] = [
      [
        "a reused link",
        async () => {
          const { token } = await inviteByMail(`reuse-${unique()}@example.test`);
          expect((await acceptWith({ token, name: "First Use", password: "password one" })).status).toBe(200);
          return { token, expectStatus: 410, message: /already been used/ };
        },
      ],
      [
        "an expired link",
        async () => {
          const { token, w } = await inviteByMail(`late-${unique()}@example.test`);
          await db.update(invitations).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(invitations.orgId, w.org.id));
          return { token, expectStatus: 410, message: /expired/ };
        },
      ],
      [
        "a tampered link",
        async () => {
          const { token } = await inviteByMail(`tamper-${unique()}@example.test`);
          const flipped = (token[0] === "A" ? "B" : "A") + token.slice(1);
          return { token: flipped, expectStatus: 404, message: /not valid/ };
        },
      ],
      [
        "a link whose organisation was removed",
        async () => {
          const { token, w } = await inviteByMail(`orphan-${unique()}@example.test`);
          await db.delete(organisations).where(eq(organisations.id, w.org.id));
          return { token, expectStatus: 410, message: /no longer exists/ };
        },
      ],
      [
        "a withdrawn link",
        async () => {
          const { token, w } = await inviteByMail(`withdrawn-${unique()}@example.test`);
          await db.update(invitations).set({ revokedAt: new Date() }).where(eq(invitations.orgId, w.org.id));
          return { token, expectStatus: 410, message: /withdrawn/ };
        },
      ],
    ];
    it.each(cases)("%s", async (_name, arrange) => {
      const { token, expectStatus, message } = await arrange();
      const before = await snapshot();
      const res = await acceptWith({ token, name: "Late Comer", password: "password two" });
      expect(res.status).toBe(expectStatus);
      expect(res.json.error).toMatch(message);
      expect(await snapshot()).toBe(before);
    });
  });

  it("an invitation for someone already in the organisation is refused", async () => {
    const w = await makeOrg("Teasel");
    const res = await call(invitationsRoute.POST, {
      method: "POST",
      path: "/api/x",
      params: { orgSlug: w.org.slug },
      body: { email: w.people.estimator.email, role: "admin" },
      cookie: await sessionCookie(w.people.admin),
    });
    expect(res.status).toBe(409);
    expect(res.json.fields?.email).toMatch(/Already a member/);
  });

  it("stores only a hash of the token", async () => {
    const { token, w } = await inviteByMail(`hash-${unique()}@example.test`);
    const rows = await db.select({ tokenHash: invitations.tokenHash }).from(invitations).where(eq(invitations.orgId, w.org.id));
    expect(rows.map((r) => r.tokenHash)).not.toContain(token);
    expect(rows.every((r) => /^[0-9a-f]{64}$/.test(r.tokenHash))).toBe(true);
  });
});

describe("accepting an invitation is throttled like signing in", () => {
  /** As our server forwards it: the socket's address under the process's peer token. */
  const acceptFrom = async (address: string, body: Record<string, unknown>) => {
    process.env.MITERWISE_PEER_TOKEN ??= `peer-${unique()}`;
    const req = new NextRequest(new URL("/api/invitations/accept", env.NEXTAUTH_URL), {
      method: "POST",
      headers: { "content-type": "application/json", "x-miterwise-peer": `${process.env.MITERWISE_PEER_TOKEN} ${address}` },
      body: JSON.stringify(body),
    });
    const res = await accept.POST(req, { params: Promise.resolve({}) });
    return { status: res.status, json: (await res.json()) as { error?: string; fields?: Record<string, string> } };
  };

  it("30 wrong passwords for an existing account through its invitation are stopped after 5, the right one too", async () => {
    const first = await makeOrg("Alder");
    const person = first.people.admin;
    const { token } = await inviteByMail(person.email, "estimator");
    const address = `198.51.100.${Math.floor(Math.random() * 200) + 1}`;
    const statuses: number[] = [];
    for (let i = 0; i < 30; i++) statuses.push((await acceptFrom(address, { token, password: `guess number ${i}` })).status);
    expect(statuses.filter((s) => s === 422)).toHaveLength(5);
    expect(statuses.filter((s) => s === 429)).toHaveLength(25);
    const right = await acceptFrom(address, { token, password: PASSWORD });
    expect(right.status).toBe(429);
    expect(right.json.error).toMatch(/Too many failed attempts/);
    // The same account's sign-in from that address is blocked too: one limiter for both.
    await expect(authorizeCredentials({ email: person.email, password: PASSWORD }, address)).rejects.toThrow(/Too many/);
  });

  it("guessing invitation links is throttled per address", async () => {
    const address = `203.0.113.${Math.floor(Math.random() * 200) + 1}`;
    let blocked = 0;
    for (let i = 0; i < 110; i++) {
      const res = await acceptFrom(address, { token: `made-up-${i}-${unique()}`, name: "Guesser", password: "a fresh password" });
      if (res.status === 429) blocked++;
      else expect(res.status).toBe(404);
    }
    expect(blocked).toBe(10);
  });

  it("a new account may not use a common password or its own e-mail", async () => {
    const email = `chooser-${unique()}@example.test`;
    const { token } = await inviteByMail(email);
    const before = await snapshot();
    for (const password of ["password", "12345678", "        ", email]) {
      const res = await acceptWith({ token, name: "Chooser", password });
      expect(res.status, password).toBe(422);
      expect(res.json.fields?.password).toBeTruthy();
    }
    expect(await snapshot()).toBe(before);
  });
});

describe("one live invitation per address", () => {
  async function send(w: Awaited<ReturnType<typeof makeOrg>>, email: string, role: string) {
    const tokens = async () => new Set((await readOutbox(outboxDir())).filter((m) => m.to.includes(email)).map((m) => m.text.match(/\/invite\/([A-Za-z0-9_-]+)/)![1]!));
    const before = await tokens();
    const res = await call(invitationsRoute.POST, { method: "POST", path: "/api/x", params: { orgSlug: w.org.slug }, body: { email, role }, cookie: await sessionCookie(w.people.admin) });
    const token = [...(await tokens())].find((t) => !before.has(t));
    return { res, token: token! };
  }
  const pending = async (w: Awaited<ReturnType<typeof makeOrg>>) =>
    (await call(invitationsRoute.GET, { method: "GET", path: "/api/x", params: { orgSlug: w.org.slug }, cookie: await sessionCookie(w.people.admin) })).json
      .invitations as { email: string; role: string }[];

  it("a new invitation to the same address replaces the old one, and the old link says so and changes nothing", async () => {
    const w = await makeOrg("Wrenfield");
    const email = `twice-${unique()}@example.test`;
    const old = await send(w, email, "admin");
    const fresh = await send(w, email, "estimator");
    expect(fresh.res.status).toBe(201);
    expect(fresh.res.json.replaced).toEqual([{ role: "admin" }]);
    expect((await pending(w)).filter((i) => i.email === email)).toEqual([expect.objectContaining({ role: "estimator" })]);

    const before = await snapshot();
    const stale = await acceptWith({ token: old.token, name: "Ada Twice", password: "a fresh password" });
    expect(stale.status).toBe(410);
    expect(stale.json.error).toMatch(/replaced by a newer one/);
    expect(await snapshot()).toBe(before);

    const ok = await acceptWith({ token: fresh.token, name: "Ada Twice", password: "a fresh password" });
    expect(ok.json).toMatchObject({ role: "estimator" });
  });

  it("two invitations sent at the same moment leave exactly one live", async () => {
    const w = await makeOrg("Brackenby");
    const email = `race-${unique()}@example.test`;
    const cookie = await sessionCookie(w.people.admin);
    const post = (role: string) => call(invitationsRoute.POST, { method: "POST", path: "/api/x", params: { orgSlug: w.org.slug }, body: { email, role }, cookie });
    const answers = await Promise.all([post("admin"), post("estimator")]);
    for (const a of answers) expect([201, 409]).toContain(a.status);
    expect((await pending(w)).filter((i) => i.email === email)).toHaveLength(1);
  });

  it("the database refuses a second live invitation to one address (partial unique index)", async () => {
    const w = await makeOrg("Marrowick");
    const email = `direct-${unique()}@example.test`;
    const row = { orgId: w.org.id, email, role: "estimator" as const, expiresAt: new Date(Date.now() + 86_400_000) };
    await db.insert(invitations).values({ ...row, tokenHash: unique() });
    await expect(db.insert(invitations).values({ ...row, role: "admin", tokenHash: unique() })).rejects.toMatchObject({
      cause: { code: "23505", constraint: "invitations_one_live_per_address" },
    });
  });
});
