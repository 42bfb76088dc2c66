import { z } from "zod";
import { passwordProblem } from "@/lib/auth/password-policy";

/** Free text a person types: trimmed, no control characters, bounded. Stored and shown as text. */
export const text = (label: string, max: number) =>
  z
    .string({ error: `${label} is required.` })
    .trim()
    .min(1, `${label} is required.`)
    .max(max, `${label} must be at most ${max} characters.`)
    .refine((v) => !/[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/.test(v), `${label} contains characters that are not allowed.`)
    // Half of a UTF-16 surrogate pair is no character at all: PostgreSQL's jsonb (the change log) refuses it.
    .refine((v) => !LONE_SURROGATE.test(v), `${label} contains characters that are not allowed.`);

const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

export const optionalText = (label: string, max: number) =>
  z
    .union([text(label, max), z.literal("").transform(() => null), z.null()])
    .optional();

export const email = z
  .string({ error: "E-mail is required." })
  .trim()
  .toLowerCase()
  .max(254, "E-mail must be at most 254 characters.")
  .pipe(z.email("Enter a valid e-mail address."));

/** A password someone chooses (see lib/auth/password-policy.ts); the e-mail check is on the form's schema. */
export const password = z
  .string({ error: "Password is required." })
  .min(1, "Password is required.")
  .superRefine((value, ctx) => {
    const problem = passwordProblem(value);
    if (problem) ctx.addIssue({ code: "custom", message: problem });
  });

export const uuid = z.uuid("Not a valid id.");

/** PostgreSQL `integer` (int4) — the type of every version column; a larger number cannot name a version. */
const INT4_MAX = 2_147_483_647;
const versionMessage = "Version is required: reload and try again.";

/** The row version a client last saw, sent back with an edit so a stale edit is refused (409). */
export const version = z.number({ error: versionMessage }).int(versionMessage).min(1, versionMessage).max(INT4_MAX, versionMessage);
/** The same from `?version=N` on a DELETE. */
export const versionParam = z.coerce.number({ error: "Give ?version=N: reload and try again." }).int().min(1).max(INT4_MAX);
