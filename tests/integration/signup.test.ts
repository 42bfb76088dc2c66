import { describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import * as signup from "@/app/api/signup/route";
import { db } from "@/db/client";
import { memberships, organisations, users } from "@/db/schema";
import { call } from "./helpers/http";
import { snapshot } from "./helpers/snapshot";
import { unique } from "./helpers/world";

const good = () => ({
  name: "Wilhelmina Oakes",
  email: `Wil.Oakes-${unique()}@Example.test`,
  password: "long enough pass",
  organisationName: "Oakes & Daughters Trim",
});

describe("POST /api/signup", () => {
  it("refuses the most common passwords, one character repeated and the e-mail itself (NIST SP 800-63B 5.1.1.2)", async () => {
    const input = good();
    const before = await snapshot();
    for (const password of ["password", "12345678", "        ", "qwertyuiop", "Password1", input.email, input.email.toUpperCase(), "short"]) {
      const res = await call(signup.POST, { method: "POST", path: "/api/signup", body: { ...input, password } });
      expect(res.status, password).toBe(422);
      expect(res.json.fields?.password, password).toBeTruthy();
    }
    expect(await snapshot()).toBe(before);
    // No composition rules: a long phrase of plain words is fine.
    expect((await call(signup.POST, { method: "POST", path: "/api/signup", body: { ...input, password: "walnut stool and apron" } })).status).toBe(201);
  });

  it("creates the person, their organisation, and makes them its admin; no hash in the answer", async () => {
    const input = good();
    const res = await call(signup.POST, { method: "POST", path: "/api/signup", body: input });
    expect(res.status).toBe(201);
    expect(JSON.stringify(res.json)).not.toMatch(/hash|\$2[aby]\$/);
    const [user] = await db.select().from(users).where(eq(users.email, input.email.toLowerCase()));
    expect(user?.name).toBe("Wilhelmina Oakes");
    const [org] = await db.select().from(organisations).where(eq(organisations.id, (res.json.organisation as { id: string }).id));
    expect(org?.slug).toMatch(/^oakes-daughters-trim/);
    const [m] = await db.select().from(memberships).where(eq(memberships.userId, user!.id));
    expect(m).toMatchObject({ orgId: org!.id, role: "admin" });
  });

  it("refuses a second account for the same e-mail, whatever its case", async () => {
    const input = good();
    expect((await call(signup.POST, { method: "POST", path: "/api/signup", body: input })).status).toBe(201);
    const before = await snapshot();
    const again = await call(signup.POST, {
      method: "POST",
      path: "/api/signup",
      body: { ...input, email: input.email.toUpperCase(), organisationName: "Another" },
    });
    expect(again.status).toBe(409);
    expect(again.json.fields?.email).toMatch(/already exists/);
    expect(await snapshot()).toBe(before);
  });

  const bad: [string, Record<string, unknown>, string, RegExp][] = [
    ["an overlong name", { name: "N".repeat(101) }, "name", /at most 100/],
    ["an invalid e-mail", { email: "not-an-email" }, "email", /valid e-mail/],
    ["an empty password", { password: "" }, "password", /required/],
    ["a short password", { password: "short" }, "password", /at least 8/],
    ["a blank company", { organisationName: "   " }, "organisationName", /required/],
    ["a control character", { name: "Bad\u0000Name" }, "name", /not allowed/],
    ["a number for a name", { name: 42 }, "name", /.+/],
  ];
  it.each(bad)("refuses %s with a field message and writes nothing", async (_label, patch, field, message) => {
    const before = await snapshot();
    const res = await call(signup.POST, { method: "POST", path: "/api/signup", body: { ...good(), ...patch } });
    expect(res.status).toBe(422);
    expect(res.json.fields?.[field]).toMatch(message);
    expect(await snapshot()).toBe(before);
  });

  it("answers malformed JSON with 400, not 500", async () => {
    const res = await call(signup.POST, { method: "POST", path: "/api/signup", rawBody: "{name: oops" });
    expect(res.status).toBe(400);
    expect(res.json.error).toMatch(/not valid JSON/);
  });

  it("keeps SQL and HTML in a name as plain text", async () => {
    const name = `<img src=x onerror=alert(1)>'); drop table users;--`;
    const input = { ...good(), name, organisationName: `<b>Bold</b> Trim'--` };
    const res = await call(signup.POST, { method: "POST", path: "/api/signup", body: input });
    expect(res.status).toBe(201);
    const [user] = await db.select().from(users).where(eq(users.email, input.email.toLowerCase()));
    expect(user?.name).toBe(name);
    expect((res.json.organisation as { name: string }).name).toBe(`<b>Bold</b> Trim'--`);
  });
});
