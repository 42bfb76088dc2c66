import { beforeEach, describe, expect, it } from "vitest";
import { pool } from "@/db/client";
import { authorizeCredentials, SIGN_IN_FAILED } from "@/lib/auth/options";
import { throttlePolicy } from "@/db/queries/sign-in-throttle";
import { makeOrg, PASSWORD, unique } from "./helpers/world";

// Each test uses its own address so the per-address counter of one does not leak into another.
let address: string;
beforeEach(() => {
  address = `203.0.113.${Math.floor(Math.random() * 250)}-${unique()}`;
});

describe("sign-in", () => {
  it("accepts the right password, whatever the e-mail's case", async () => {
    const w = await makeOrg("Hawthorn");
    const user = await authorizeCredentials({ email: w.people.admin.email.toUpperCase(), password: PASSWORD }, address);
    expect(user).toEqual({ id: w.people.admin.id, name: w.people.admin.name, email: w.people.admin.email });
  });

  it("answers a wrong password and an unknown e-mail with the same clear message", async () => {
    const w = await makeOrg("Hawthorn");
    await expect(authorizeCredentials({ email: w.people.admin.email, password: "nope nope" }, address)).rejects.toThrow(SIGN_IN_FAILED);
    await expect(authorizeCredentials({ email: "nobody@example.test", password: "nope nope" }, address)).rejects.toThrow(SIGN_IN_FAILED);
  });

  it(`slows an account down after ${throttlePolicy.limits.email} failures, even with the right password, from any address`, async () => {
    const w = await makeOrg("Hawthorn");
    const email = w.people.estimator.email;
    for (let i = 0; i < throttlePolicy.limits.email; i++) {
      await expect(authorizeCredentials({ email, password: "wrong guess" }, `${address}-${i}`)).rejects.toThrow(SIGN_IN_FAILED);
    }
    await expect(authorizeCredentials({ email, password: PASSWORD }, "198.51.100.7")).rejects.toThrow(/Too many failed sign-ins. Try again in 1 minute/);
    // The counter lives in PostgreSQL, so another app server would see the same block.
    const { rows } = await pool.query("select failures, blocked_until > now() as blocked from sign_in_throttle where key = $1", [`email:${email}`]);
    expect(rows[0]).toEqual({ failures: throttlePolicy.limits.email, blocked: true });
  });

  it(`slows an address down after ${throttlePolicy.limits.ip} failures across accounts`, async () => {
    for (let i = 0; i < throttlePolicy.limits.ip; i++) {
      await expect(authorizeCredentials({ email: `spray-${i}-${unique()}@example.test`, password: "guess" + i }, address)).rejects.toThrow(SIGN_IN_FAILED);
    }
    const w = await makeOrg("Hawthorn");
    await expect(authorizeCredentials({ email: w.people.admin.email, password: PASSWORD }, address)).rejects.toThrow(/Too many failed sign-ins/);
  });

  it("a block expires, and a success clears the account's count", async () => {
    const w = await makeOrg("Hawthorn");
    const email = w.people.project_manager.email;
    for (let i = 0; i < throttlePolicy.limits.email; i++) {
      await expect(authorizeCredentials({ email, password: "wrong guess" }, address)).rejects.toThrow();
    }
    await pool.query("update sign_in_throttle set blocked_until = now() - interval '1 second' where key in ($1, $2)", [`email:${email}`, `ip:${address}`]);
    await expect(authorizeCredentials({ email, password: PASSWORD }, address)).resolves.toMatchObject({ email });
    const { rows } = await pool.query("select 1 from sign_in_throttle where key = $1", [`email:${email}`]);
    expect(rows).toHaveLength(0);
  });

  it("refuses malformed credentials without touching the database", async () => {
    await expect(authorizeCredentials({ email: "x".repeat(300), password: "" }, address)).rejects.toThrow(SIGN_IN_FAILED);
    await expect(authorizeCredentials(null, address)).rejects.toThrow(SIGN_IN_FAILED);
  });
});
