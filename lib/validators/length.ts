import { z } from "zod";
import { parseLength } from "@/takeoff";

/**
 * A length as people type it (25 7/8, 2'-1 7/8", 635 mm …) or as a number of inches, parsed by the
 * engine so forms, the API and the engine agree on what a length means. `example` suits the message to
 * the field (a kerf is never 2'-11 1/2").
 */
export const lengthInput = (label: string, opts: { allowZero?: boolean; example?: string } = {}) =>
  z.union([z.number(), z.string()], { error: `${label} is required.` }).transform((value, ctx) => {
    let inches: number;
    try {
      inches = typeof value === "number" ? value : parseLength(value);
    } catch {
      ctx.addIssue({ code: "custom", message: `${label}: write a length such as ${opts.example ?? `35 1/2, 2'-11 1/2" or 902 mm`}.` });
      return z.NEVER;
    }
    if (!Number.isFinite(inches) || inches < 0 || (!opts.allowZero && inches === 0)) {
      ctx.addIssue({ code: "custom", message: `${label} must be ${opts.allowZero ? "zero or more" : "more than zero"}.` });
      return z.NEVER;
    }
    if (inches > 12 * 1000) {
      ctx.addIssue({ code: "custom", message: `${label} is longer than anything on a plan (over 1000 ft).` });
      return z.NEVER;
    }
    return inches;
  });
