import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * Refuses a state-changing request that a browser says came from another site — including a sibling
 * subdomain ("same-site"), which SameSite cookies do not stop. Browsers send `Sec-Fetch-Site` (Fetch
 * Metadata) and `Origin` on every cross-origin POST/PATCH/DELETE; clients that send neither (scripts,
 * tests, server-to-server) are not browsers riding a victim's cookie, so they pass.
 * OWASP ASVS 4.0 V13.2.3 / CSRF Prevention Cheat Sheet, "Fetch Metadata" and "Verifying Origin".
 */
export function refuseCrossSite(req: Request): void {
  if (SAFE_METHODS.has(req.method.toUpperCase())) return;
  const site = req.headers.get("sec-fetch-site");
  if (site !== null && site !== "same-origin" && site !== "none") throw crossSite();
  const origin = req.headers.get("origin");
  if (origin !== null && !allowedOrigins(req).has(origin)) throw crossSite();
}

const crossSite = () => new AppError(403, "This request came from another site, so it was refused. Use Miterwise from its own address.", undefined, undefined, "cross_site");

/** The app's public address, and the address this request was sent to (a load balancer may add its own). */
function allowedOrigins(req: Request): Set<string> {
  const allowed = new Set([new URL(env.NEXTAUTH_URL).origin, new URL(req.url).origin]);
  const host = req.headers.get("x-forwarded-host") ?? req.headers.get("host");
  if (host) {
    const proto = req.headers.get("x-forwarded-proto") ?? new URL(req.url).protocol.replace(":", "");
    allowed.add(`${proto}://${host}`);
  }
  return allowed;
}
