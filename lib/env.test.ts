import { mkdtempSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterEach, describe, expect, it } from "vitest";
import { listensOnLoopbackOnly, loadEnv, outboxAvailable } from "./env";

const dir = () => mkdtempSync(path.join(tmpdir(), "miterwise-env-"));
const OLD_PUBLIC_SECRET = "miterwise-local-demo-secret-change-me";

describe("settings", () => {
  it("a production server without NEXTAUTH_SECRET refuses to start", () => {
    expect(() => loadEnv({ NODE_ENV: "production", MITERWISE_DATA_DIR: dir() })).toThrow(/NEXTAUTH_SECRET: required in production/);
    expect(() => loadEnv({ NODE_ENV: "production", NEXTAUTH_SECRET: "short" })).toThrow(/NEXTAUTH_SECRET/);
    const secret = "x".repeat(40);
    expect(loadEnv({ NODE_ENV: "production", NEXTAUTH_SECRET: secret }).NEXTAUTH_SECRET).toBe(secret);
  });

  it("the demo and tests get a random secret per checkout, kept in the data folder", () => {
    const a = dir();
    const b = dir();
    const first = loadEnv({ NODE_ENV: "development", MITERWISE_DATA_DIR: a }).NEXTAUTH_SECRET;
    expect(first).not.toBe(OLD_PUBLIC_SECRET);
    expect(first.length).toBeGreaterThanOrEqual(32);
    expect(loadEnv({ NODE_ENV: "development", MITERWISE_DATA_DIR: a }).NEXTAUTH_SECRET).toBe(first);
    expect(loadEnv({ NODE_ENV: "development", MITERWISE_DATA_DIR: b }).NEXTAUTH_SECRET).not.toBe(first);
    expect(statSync(path.join(a, "auth-secret")).mode & 0o077).toBe(0);
  });

  it("the trusted proxy count is validated", () => {
    expect(loadEnv({ NEXTAUTH_SECRET: "y".repeat(32) }).TRUSTED_PROXY_COUNT).toBe(0);
    expect(loadEnv({ NEXTAUTH_SECRET: "y".repeat(32), TRUSTED_PROXY_COUNT: "2" }).TRUSTED_PROXY_COUNT).toBe(2);
    for (const bad of ["-1", "1.5", "eleven", "11"]) {
      expect(() => loadEnv({ NEXTAUTH_SECRET: "y".repeat(32), TRUSTED_PROXY_COUNT: bad }), bad).toThrow(/TRUSTED_PROXY_COUNT/);
    }
  });
});

describe("the demo outbox", () => {
  const saved = process.env.MITERWISE_LISTEN_HOST;
  afterEach(() => {
    if (saved === undefined) delete process.env.MITERWISE_LISTEN_HOST;
    else process.env.MITERWISE_LISTEN_HOST = saved;
  });

  it("exists only while the app listens on loopback only", () => {
    for (const host of ["127.0.0.1", "localhost", "::1", "[::1]"]) expect(listensOnLoopbackOnly(host), host).toBe(true);
    for (const host of ["0.0.0.0", "::", "192.168.1.20", "example.test", ""]) expect(listensOnLoopbackOnly(host), host).toBe(false);
    process.env.MITERWISE_LISTEN_HOST = "0.0.0.0";
    expect(outboxAvailable()).toBe(false);
    delete process.env.MITERWISE_LISTEN_HOST; // `next start` / `next dev` directly: we cannot tell, so no
    expect(outboxAvailable()).toBe(false);
    process.env.MITERWISE_LISTEN_HOST = "127.0.0.1";
    expect(outboxAvailable()).toBe(!process.env.SMTP_URL);
  });
});
