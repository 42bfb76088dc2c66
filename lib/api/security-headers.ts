/**
 * The response headers every answer carries (OWASP ASVS 4.0 V14.4, OWASP Secure Headers Project), set once
 * by proxy.ts. The CSP is the one the app, react-pdf and its pdf.js worker run under (checked by
 * tests/browser/security-headers.spec.ts). Next.js's App Router writes inline bootstrap scripts, so scripts
 * need 'unsafe-inline' unless every page is rendered per request with a nonce; everything else is 'self'.
 */

/** Where the browser sends plan-set bytes: the hosted upload service, or the local stand-in (demo, tests). */
function uploadOrigins(env: NodeJS.ProcessEnv): string[] {
  if (env.UPLOADTHING_TOKEN && !env.UPLOADTHING_INGEST_URL) {
    return ["https://*.ingest.uploadthing.com", "https://uploadthing.com", "https://*.ufs.sh", "https://utfs.io"];
  }
  const port = Number(env.UPLOAD_STAND_IN_PORT ?? 3900);
  const origins = new Set([`http://127.0.0.1:${port}`, `http://localhost:${port}`]);
  for (const url of [env.UPLOADTHING_INGEST_URL, env.UPLOADTHING_API_URL]) {
    if (url) origins.add(new URL(url).origin);
  }
  return [...origins];
}

export function contentSecurityPolicy(env: NodeJS.ProcessEnv = process.env): string {
  const dev = env.NODE_ENV === "development";
  return [
    "default-src 'self'",
    // Dev only: React's development build and hot reload evaluate code.
    `script-src 'self' 'unsafe-inline'${dev ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self' data:",
    `connect-src 'self' ${uploadOrigins(env).join(" ")}${dev ? " ws:" : ""}`,
    // react-pdf's pdf.js worker is a same-origin file; pdf.js may also start one from a blob.
    "worker-src 'self' blob:",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}

/** The plan file is untrusted bytes from a customer: never sniffed, never run, never framed. */
export const PLAN_FILE_CSP = "sandbox; default-src 'none'; frame-ancestors 'none'";
const PLAN_FILE = /^\/api\/orgs\/[^/]+\/projects\/[^/]+\/plan-sets\/[^/]+\/file$/;

export function securityHeaders(pathname: string, env: NodeJS.ProcessEnv = process.env): Record<string, string> {
  const headers: Record<string, string> = {
    "Content-Security-Policy": PLAN_FILE.test(pathname) ? PLAN_FILE_CSP : contentSecurityPolicy(env),
    "X-Content-Type-Options": "nosniff",
    "X-Frame-Options": "DENY",
    "Referrer-Policy": "strict-origin-when-cross-origin",
    // Browsers ignore it over plain http, so it is safe to send from the demo too.
    "Strict-Transport-Security": "max-age=31536000; includeSubDomains",
    "Permissions-Policy": "camera=(), microphone=(), geolocation=(), payment=()",
    "Cross-Origin-Opener-Policy": "same-origin",
  };
  // API answers are per person and per organisation: no cache may keep them. The plan file and the
  // downloads set their own Cache-Control.
  if (pathname.startsWith("/api/") && !PLAN_FILE.test(pathname)) headers["Cache-Control"] = "no-store";
  return headers;
}
