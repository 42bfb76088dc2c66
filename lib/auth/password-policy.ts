import { dictionary } from "@zxcvbn-ts/language-common";

/**
 * Password rules after NIST SP 800-63B §5.1.1.2: at least 8 characters (and at most 200, to bound hashing),
 * no composition rules, and refuse what is known to be guessed first — the ~49,000 most common passwords seen in
 * breaches (the list @zxcvbn-ts/language-common ships, so nothing is fetched), one character repeated, and the
 * account's own e-mail address. Checked on every password a person chooses.
 */
const common = new Set((dictionary["passwords-common"] as string[]).map((p) => p.toLowerCase()));

export const PASSWORD_MIN = 8;
export const PASSWORD_MAX = 200;

/** Why this password may not be chosen, in words for the form, or null when it is acceptable. */
export function passwordProblem(password: string, email?: string | null): string | null {
  if (password.length < PASSWORD_MIN) return `Password must be at least ${PASSWORD_MIN} characters.`;
  if (password.length > PASSWORD_MAX) return `Password must be at most ${PASSWORD_MAX} characters.`;
  const folded = password.trim().toLowerCase();
  if (new Set(password).size === 1 || folded.length === 0) return "Choose a password that is not one character repeated.";
  if (common.has(folded) || common.has(folded.replace(/\s+/g, ""))) {
    return "This password is one of the most common ones and is guessed first. Choose another.";
  }
  if (email) {
    const address = email.trim().toLowerCase();
    const local = address.split("@")[0] ?? "";
    if (folded === address || (local.length >= PASSWORD_MIN && folded === local)) {
      return "Your password must not be your e-mail address.";
    }
  }
  return null;
}
