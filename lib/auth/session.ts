import { getToken, type JWT } from "next-auth/jwt";
import type { NextRequest } from "next/server";
import { cookies, headers } from "next/headers";
import { env } from "@/lib/env";

const secureCookie = env.NEXTAUTH_URL.startsWith("https://");

/**
 * Who a session cookie says the caller is, and which of their session versions it was issued under. The
 * version is compared with the user's row on the same read that loads the membership (`getOrgContext`,
 * `getSessionUser`), so signing out, changing the password or being removed ends every copy of the cookie.
 */
export type SessionRef = { userId: string; sessionVersion: number };

function sessionOf(token: JWT | null): SessionRef | null {
  if (!token?.sub || typeof token.sv !== "number") return null;
  return { userId: token.sub, sessionVersion: token.sv };
}

/** The session of a route handler's request, or null. */
export async function sessionFromRequest(req: NextRequest | Request): Promise<SessionRef | null> {
  return sessionOf(await getToken({ req: req as NextRequest, secret: env.NEXTAUTH_SECRET, secureCookie }));
}

/** The same for server components and server actions, which read the request through next/headers. */
export async function currentSession(): Promise<SessionRef | null> {
  const [h, c] = await Promise.all([headers(), cookies()]);
  const req = { headers: h, cookies: c } as unknown as NextRequest;
  return sessionOf(await getToken({ req, secret: env.NEXTAUTH_SECRET, secureCookie }));
}
