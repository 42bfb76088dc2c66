import { describe, expect, it } from "vitest";
import { slugify } from "./slug";

describe("slugify", () => {
  it.each([
    ["Cedar & Sons Trim", "cedar-sons-trim"],
    ["  Ébéniste Côté  ", "ebeniste-cote"],
    ["<script>alert(1)</script>", "script-alert-1-script"],
    ["!!!", "org-co"],
    ["API", "api-co"],
    ["Sign In", "sign-in-co"],
    ["A".repeat(60), "a".repeat(40)],
  ])("%s → %s", (name, slug) => {
    expect(slugify(name)).toBe(slug);
  });
});
