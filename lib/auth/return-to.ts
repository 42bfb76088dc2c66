/**
 * Where sign-in may send someone afterwards: a path on this site, never another origin (an open redirect through
 * the sign-in page would make a convincing phishing link; OWASP ASVS 5.0 V3.7 / CWE-601). The candidate is parsed
 * the way a browser parses a link, so `//evil`, `/\evil`, `https://evil` and `javascript:` all resolve to another
 * origin and fall back.
 */
const HERE = "http://miterwise.invalid";

export const SIGNED_IN_HOME = "/orgs";

export function safeReturnPath(candidate: string | null | undefined, fallback = SIGNED_IN_HOME): string {
  if (typeof candidate !== "string" || !candidate.startsWith("/") || candidate.length > 2048) return fallback;
  // Control characters are stripped by URL parsers (a tab inside `/\t/evil` would leave `//evil`): refuse them.
  if (/[\u0000-\u001f\u007f\\]/.test(candidate)) return fallback;
  let url: URL;
  try {
    url = new URL(candidate, HERE);
  } catch {
    return fallback;
  }
  if (url.origin !== HERE) return fallback;
  // Back to the sign-in page would only ask again.
  if (url.pathname === "/sign-in" || url.pathname.startsWith("/api/")) return fallback;
  return `${url.pathname}${url.search}${url.hash}`;
}

/** The request header the proxy puts the asked-for path in, for pages that send a signed-out visitor to sign in. */
export const REQUEST_PATH_HEADER = "x-miterwise-path";
