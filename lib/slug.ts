import { randomBytes } from "node:crypto";

/** URL-safe organisation slug from a company name: "Cedar & Sons Trim" → "cedar-sons-trim". */
export function slugify(name: string): string {
  const base = name
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 40)
    .replace(/-+$/g, "");
  return RESERVED.has(base) || !base ? `${base || "org"}-co` : base;
}

// First path segments the app itself uses; an organisation named like one would be unreachable.
const RESERVED = new Set(["api", "orgs", "sign-in", "sign-up", "sign-out", "invite", "demo", "_next", "favicon-ico", "icon-svg"]);

export const slugSuffix = () => randomBytes(3).toString("hex");
