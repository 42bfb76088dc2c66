import { getToken } from "next-auth/jwt";
import type { NextRequest } from "next/server";
import { cookies, headers } from "next/headers";
import { env } from "@/lib/env";

const secureCookie = env.NEXTAUTH_URL.startsWith("https://");

/** The signed-in user's id from the session cookie of a route handler's request, or null. */
export async function userIdFromRequest(req: NextRequest | Request): Promise<string | null> {
  const token = await getToken({ req: req as NextRequest, secret: env.NEXTAUTH_SECRET, secureCookie });
  return token?.sub ?? null;
}

/** The same for server components and server actions, which read the request through next/headers. */
export async function currentUserId(): Promise<string | null> {
  const [h, c] = await Promise.all([headers(), cookies()]);
  const req = { headers: h, cookies: c } as unknown as NextRequest;
  const token = await getToken({ req, secret: env.NEXTAUTH_SECRET, secureCookie });
  return token?.sub ?? null;
}
