import { randomBytes } from "node:crypto";
import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";
import { z } from "zod";
import { DEFAULT_DATABASE_URL } from "@/db/config";

/**
 * Every setting the server reads, validated once at start-up. Defaults point at the local stand-ins
 * (private PostgreSQL on loopback, the SMTP stand-in) so the demo needs no configuration; production
 * overrides them with environment variables (see README, "Beyond one machine").
 */
const schema = z.object({
  NODE_ENV: z.string().optional(),
  DATABASE_URL: z.string().url().default(DEFAULT_DATABASE_URL),
  NEXTAUTH_URL: z.string().url().default("http://127.0.0.1:3000"),
  // Signs every session cookie. Required in production; see `secretOrLocal` for the demo and tests.
  NEXTAUTH_SECRET: z.string().min(32, "must be at least 32 characters (e.g. `openssl rand -base64 32`)").optional(),
  // A real provider: smtp(s)://user:pass@host:port. Unset means the local stand-in below.
  SMTP_URL: z.string().url().optional(),
  SMTP_HOST: z.string().default("127.0.0.1"),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(2525),
  MAIL_FROM: z.string().default("Miterwise <no-reply@miterwise.invalid>"),
  MITERWISE_DATA_DIR: z.string().default(".data"),
  // Where the SMTP stand-in keeps messages; the demo outbox page reads it.
  OUTBOX_DIR: z.string().optional(),
  // How many reverse proxies of ours stand in front of the app, each appending to X-Forwarded-For. 0: the
  // client is whoever opened the socket, and X-Forwarded-For (which anyone can send) is ignored.
  TRUSTED_PROXY_COUNT: z.coerce.number().int("must be a whole number").min(0).max(10).default(0),
});

export type Env = Omit<z.infer<typeof schema>, "NEXTAUTH_SECRET"> & { NEXTAUTH_SECRET: string };

/**
 * Reads the settings from `source`. A production server without NEXTAUTH_SECRET refuses to start: a secret
 * anyone could look up would let anyone forge a session. Elsewhere (the demo, tests, development) the secret
 * is generated once per checkout and kept in the data folder, so no two checkouts share one.
 */
export function loadEnv(source: Record<string, string | undefined>): Env {
  const parsed = schema.safeParse(source);
  const issues = parsed.success ? [] : parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
  const building = source.NEXT_PHASE === "phase-production-build";
  if (parsed.success && !parsed.data.NEXTAUTH_SECRET && source.NODE_ENV === "production" && !building) {
    issues.push("  NEXTAUTH_SECRET: required in production (a long random secret shared by every app server)");
  }
  if (!parsed.success || issues.length > 0) throw new Error(`Invalid environment:\n${issues.join("\n")}`);
  const data = parsed.data;
  // The build imports this module but signs nothing, so it gets a throwaway secret.
  const secret = data.NEXTAUTH_SECRET ?? (building ? randomBytes(32).toString("base64") : localSecret(data.MITERWISE_DATA_DIR));
  return { ...data, NEXTAUTH_SECRET: secret };
}

/** The per-checkout secret in the data folder, made on first use (the demo script writes the same file). */
export function localSecret(dataDir: string): string {
  const file = path.join(dataDir, "auth-secret");
  try {
    return readFileSync(file, "utf8").trim();
  } catch {
    mkdirSync(dataDir, { recursive: true });
    try {
      writeFileSync(file, `${randomBytes(32).toString("base64")}\n`, { mode: 0o600, flag: "wx" });
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== "EEXIST") throw error; // another process made it first
    }
    return readFileSync(file, "utf8").trim();
  }
}

export const env = loadEnv(process.env);

export const outboxDir = () => env.OUTBOX_DIR ?? `${env.MITERWISE_DATA_DIR}/outbox`;

/** Mail goes to the local SMTP stand-in (demo and tests), not a real provider. */
export const usesMailStandIn = () => !env.SMTP_URL;

/** Whether the address the server was told to listen on (by scripts/serve.mjs) is reachable from this machine only. */
export function listensOnLoopbackOnly(host = process.env.MITERWISE_LISTEN_HOST): boolean {
  if (!host) return false;
  const h = host.replace(/^\[|\]$/g, "").toLowerCase();
  return h === "localhost" || h === "::1" || /^127(\.\d{1,3}){3}$/.test(h);
}

/**
 * The demo outbox lists every invitation link, so it exists only where nobody else can reach it: mail goes to
 * the stand-in and the app listens on loopback only.
 */
export const outboxAvailable = () => usesMailStandIn() && listensOnLoopbackOnly();
