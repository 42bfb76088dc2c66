import { NextRequest } from "next/server";
import { encode } from "next-auth/jwt";
import { pool } from "@/db/client";
import { env } from "@/lib/env";

// Route handlers differ in their params type; the harness only needs to call them.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Handler = (req: NextRequest, ctx: { params: Promise<any> }) => Promise<Response>;

/**
 * A real next-auth session cookie for this user, signed with the app's secret, issued under the user's current
 * session version (or `sessionVersion`, to forge an old one).
 */
export async function sessionCookie(user: { id: string; name: string; email: string }, sessionVersion?: number) {
  const sv = sessionVersion ?? (await pool.query("select session_version from users where id = $1", [user.id])).rows[0]?.session_version ?? 0;
  const jwt = await encode({ token: { sub: user.id, name: user.name, email: user.email, sv }, secret: env.NEXTAUTH_SECRET });
  return `next-auth.session-token=${jwt}`;
}

/** Calls a route handler the way Next.js does: a NextRequest and a params promise. */
export async function call(
  handler: Handler,
  opts: { method: string; path: string; params?: Record<string, string>; body?: unknown; rawBody?: string; cookie?: string },
) {
  const headers = new Headers();
  if (opts.cookie) headers.set("cookie", opts.cookie);
  let body: string | undefined;
  if (opts.rawBody !== undefined || opts.body !== undefined) {
    headers.set("content-type", "application/json");
    body = opts.rawBody ?? JSON.stringify(opts.body);
  }
  const req = new NextRequest(new URL(opts.path, env.NEXTAUTH_URL), { method: opts.method, headers, body });
  const res = await handler(req, { params: Promise.resolve(opts.params ?? {}) });
  const text = await res.text();
  let json: unknown = null;
  try {
    json = text ? JSON.parse(text) : null;
  } catch {
    json = text;
  }
  return { status: res.status, json: json as { error?: string; fields?: Record<string, string> } & Record<string, unknown> };
}
