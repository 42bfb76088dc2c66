import { NextResponse, type NextRequest } from "next/server";
import { REQUEST_PATH_HEADER } from "@/lib/auth/return-to";

/**
 * Tells server pages which path was asked for (layouts are not given it), so a signed-out visitor sent to
 * sign in comes back to that page rather than the organisation's home. Always overwritten here: a value sent
 * by the client never gets through, and sign-in checks it again (lib/auth/return-to.ts).
 */
export function proxy(request: NextRequest) {
  const headers = new Headers(request.headers);
  headers.set(REQUEST_PATH_HEADER, `${request.nextUrl.pathname}${request.nextUrl.search}`);
  return NextResponse.next({ request: { headers } });
}

// Pages only: not the API, the framework's files or the favicon.
export const config = { matcher: ["/((?!api/|_next/|icon.svg|favicon.ico).*)"] };
