import { beforeEach, describe, expect, it } from "vitest";
import { pool } from "@/db/client";
import { throttlePolicy } from "@/lib/auth/throttle";
import { authOptions, authorizeCredentials, SIGN_IN_FAILED } from "@/lib/auth/options";
import { makeOrg, PASSWORD, unique } from "./helpers/world";

// Each test uses its own addresses so the counters of one do not leak into another.
let address: string;
let n = 0;
const fresh = () => `2001:db8::${(++n).toString(16)}:${unique().slice(0, 4)}`;
beforeEach(() => {
  address = fresh();
});

const { pair, account } = throttlePolicy;

describe("sign-in", () => {
  it("accepts the right password, whatever the e-mail's case", async () => {
    const w = await makeOrg("Hawthorn");
    const user = await authorizeCredentials({ email: w.people.admin.email.toUpperCase(), password: PASSWORD }, address);
    expect(user).toMatchObject({ id: w.people.admin.id, name: w.people.admin.name, email: w.people.admin.email });
  });

  it("answers a wrong password and an unknown e-mail with the same clear message", async () => {
    const w = await makeOrg("Hawthorn");
    await expect(authorizeCredentials({ email: w.people.admin.email, password: "nope nope" }, address)).rejects.toThrow(SIGN_IN_FAILED);
    await expect(authorizeCredentials({ email: "nobody@example.test", password: "nope nope" }, address)).rejects.toThrow(SIGN_IN_FAILED);
  });

  it(`brute force: one address guessing one account is stopped after ${pair.limit} failures, the right password included`, async () => {
    const w = await makeOrg("Hawthorn");
    const email = w.people.estimator.email;
    for (let i = 0; i < pair.limit; i++) {
      await expect(authorizeCredentials({ email, password: `wrong guess ${i}` }, address)).rejects.toThrow(SIGN_IN_FAILED);
    }
    await expect(authorizeCredentials({ email, password: PASSWORD }, address)).rejects.toThrow(/Too many failed attempts. Try again in 1 minute/);
    // The counter lives in PostgreSQL, so another app server would see the same block.
    const { rows } = await pool.query("select failures, blocked_until > now() as blocked from sign_in_throttle where key = $1", [
      `pair:${email} ${address}`,
    ]);
    expect(rows[0]).toEqual({ failures: pair.limit, blocked: true });
  });

  it("brute force through the real provider: a fresh X-Forwarded-For on every try changes nothing", async () => {
    const w = await makeOrg("Hawthorn");
    const email = w.people.admin.email;
    // The options' own authorize, as next-auth calls it, with the client's headers.
    const provider = authOptions.providers[0] as unknown as { options: { authorize: (c: unknown, r: unknown) => Promise<unknown> } };
    // Our server (scripts/serve.mjs) reports the socket's address under its per-process token.
    process.env.MITERWISE_PEER_TOKEN = `peer-${unique()}`;
    const socket = fresh();
    const attempt = (password: string, i: number) =>
      provider.options.authorize(
        { email, password },
        {
          headers: {
            "x-miterwise-peer": `${process.env.MITERWISE_PEER_TOKEN} ${socket}`,
            "x-forwarded-for": `198.51.100.${i}`,
            "x-real-ip": `198.51.100.${i}`,
          },
        },
      );
    let blocked = 0;
    for (let i = 0; i < 30; i++) {
      await attempt(`guess number ${i}`, i).catch((e: Error) => {
        if (/Too many/.test(e.message)) blocked++;
      });
    }
    expect(blocked).toBe(30 - pair.limit);
    await expect(attempt(PASSWORD, 99)).rejects.toThrow(/Too many/);
    const { rows } = await pool.query("select key from sign_in_throttle where key like 'pair:%' and key like $1", [`%${email}%`]);
    expect(rows.map((r) => r.key)).toEqual([`pair:${email} ${socket}`]);
  });

  it("a peer header without our server's token is not believed", async () => {
    process.env.MITERWISE_PEER_TOKEN = `peer-${unique()}`;
    const { requestAddress } = await import("@/lib/auth/throttle");
    expect(requestAddress(new Headers({ "x-miterwise-peer": "guess 192.0.2.99" }))).toBe("unknown");
    expect(requestAddress(new Headers({ "x-forwarded-for": "192.0.2.99" }))).toBe("unknown");
    expect(requestAddress(new Headers({ "x-miterwise-peer": `${process.env.MITERWISE_PEER_TOKEN} 192.0.2.7` }))).toBe("192.0.2.7");
  });

  it("lockout: a stranger's failures against a known e-mail do not lock its owner out", async () => {
    const w = await makeOrg("Hawthorn");
    const email = w.people.project_manager.email;
    const home = address;
    await expect(authorizeCredentials({ email, password: PASSWORD }, home)).resolves.toMatchObject({ email });
    // The stranger, from one address, then from as many as it takes to trip the per-account limit.
    const stranger = fresh();
    for (let i = 0; i < 30; i++) await authorizeCredentials({ email, password: `guess ${i}` }, stranger).catch(() => {});
    for (let i = 0; i < account.limit; i++) await authorizeCredentials({ email, password: `guess ${i}` }, fresh()).catch(() => {});
    await expect(authorizeCredentials({ email, password: PASSWORD }, stranger)).rejects.toThrow(/Too many/);
    await expect(authorizeCredentials({ email, password: PASSWORD }, fresh())).rejects.toThrow(/Too many/);
    // The owner, from the address they signed in from before, still gets in.
    await expect(authorizeCredentials({ email, password: PASSWORD }, home)).resolves.toMatchObject({ email });
  });

  it("lockout: one person's mistakes do not block others behind the same address", async () => {
    const w = await makeOrg("Hawthorn");
    const office = address;
    for (let i = 0; i < 20; i++) {
      await authorizeCredentials({ email: w.people.estimator.email, password: `typo ${i}` }, office).catch(() => {});
    }
    await expect(authorizeCredentials({ email: w.people.admin.email, password: PASSWORD }, office)).resolves.toMatchObject({
      email: w.people.admin.email,
    });
  });

  it(`slows an address down after ${throttlePolicy.address.limit} failures across accounts`, async () => {
    for (let i = 0; i < throttlePolicy.address.limit; i++) {
      await expect(authorizeCredentials({ email: `spray-${i}-${unique()}@example.test`, password: "guess" + i }, address)).rejects.toThrow(SIGN_IN_FAILED);
    }
    const w = await makeOrg("Hawthorn");
    await expect(authorizeCredentials({ email: w.people.admin.email, password: PASSWORD }, address)).rejects.toThrow(/Too many/);
  });

  it("a block expires, and a success clears the pair's count", async () => {
    const w = await makeOrg("Hawthorn");
    const email = w.people.project_manager.email;
    for (let i = 0; i < pair.limit; i++) {
      await expect(authorizeCredentials({ email, password: "wrong guess" }, address)).rejects.toThrow();
    }
    await pool.query("update sign_in_throttle set blocked_until = now() - interval '1 second' where key like $1", [`%${address}`]);
    await expect(authorizeCredentials({ email, password: PASSWORD }, address)).resolves.toMatchObject({ email });
    const { rows } = await pool.query("select 1 from sign_in_throttle where key = $1", [`pair:${email} ${address}`]);
    expect(rows).toHaveLength(0);
  });

  it("refuses malformed credentials without touching the database", async () => {
    await expect(authorizeCredentials({ email: "x".repeat(300), password: "" }, address)).rejects.toThrow(SIGN_IN_FAILED);
    await expect(authorizeCredentials(null, address)).rejects.toThrow(SIGN_IN_FAILED);
  });
});
