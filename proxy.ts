// Runs before every request: refuses paths that are not valid percent-encoding, and sets the security headers.
import { NextResponse, type NextRequest } from "next/server";
import { securityHeaders } from "@/lib/api/security-headers";

export function proxy(req: NextRequest) {
  const { pathname } = req.nextUrl;
  try {
    decodeURIComponent(pathname);
  } catch {
    // Next.js would fail decoding the route's parameters and answer a plain-text 500.
    return withHeaders(NextResponse.json({ error: "The address is not valid: it has a broken %-escape." }, { status: 400 }), pathname);
  }
  return withHeaders(NextResponse.next(), pathname);
}

function withHeaders(res: NextResponse, pathname: string) {
  for (const [name, value] of Object.entries(securityHeaders(pathname))) res.headers.set(name, value);
  return res;
}
