// Runs before every request: refuses paths that are not valid percent-encoding, sets the security headers, and
// tells server pages which path was asked for.
import { NextResponse, type NextRequest } from "next/server";
import { securityHeaders } from "@/lib/api/security-headers";
import { REQUEST_PATH_HEADER } from "@/lib/auth/return-to";

// Pages only (not the API, the framework's files or the favicon) need the requested path.
const NOT_A_PAGE = /^\/(?:api\/|_next\/|icon\.svg$|favicon\.ico$)/;

export function proxy(req: NextRequest) {
  const { pathname, search } = req.nextUrl;
  try {
    decodeURIComponent(pathname);
  } catch {
    // Next.js would fail decoding the route's parameters and answer a plain-text 500.
    return withHeaders(NextResponse.json({ error: "The address is not valid: it has a broken %-escape." }, { status: 400 }), pathname);
  }
  if (NOT_A_PAGE.test(pathname)) return withHeaders(NextResponse.next(), pathname);
  // Layouts are not given the path, so a signed-out visitor sent to sign in would come back to the
  // organisation's home. Always overwritten here: a value sent by the client never gets through, and sign-in
  // checks it again (lib/auth/return-to.ts).
  const headers = new Headers(req.headers);
  headers.set(REQUEST_PATH_HEADER, `${pathname}${search}`);
  return withHeaders(NextResponse.next({ request: { headers } }), pathname);
}

function withHeaders(res: NextResponse, pathname: string) {
  for (const [name, value] of Object.entries(securityHeaders(pathname))) res.headers.set(name, value);
  return res;
}
