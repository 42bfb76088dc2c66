import type { ZodError } from "zod";

/**
 * zod issues → one message per field (the first), keyed by dotted path, exactly as the API keys its
 * 422 `fields` (`width`, `trimSpec.reveal`), so browser and server errors land in the same place.
 * lib/errors.ts has the server's copy but imports next/server, which has no place in the browser.
 */
export function fieldErrorsOf(error: ZodError, prefix = ""): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = prefix + (issue.path.join(".") || "_");
    out[key] ??= issue.message;
  }
  return out;
}
