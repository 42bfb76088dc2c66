import { describe, expect, it } from "vitest";
import { safeReturnPath } from "./return-to";

describe("safeReturnPath", () => {
  it.each([
    ["/acme/projects/3f2a/sheets/9b1c", "/acme/projects/3f2a/sheets/9b1c"],
    ["/acme/compare?ids=a,b", "/acme/compare?ids=a,b"],
    ["/acme/projects/p#plans", "/acme/projects/p#plans"],
    ["/acme/../orgs", "/orgs"],
  ])("keeps a path on this site: %s", (given, kept) => expect(safeReturnPath(given)).toBe(kept));

  // CWE-601 cases from the OWASP cheat sheet on unvalidated redirects, plus the parser tricks browsers accept.
  it.each([
    "https://evil.example/steal",
    "//evil.example/steal",
    "/\\evil.example/steal",
    "\\\\evil.example",
    "/\t/evil.example",
    "/\n/evil.example",
    "javascript:alert(1)",
    "  /acme",
    "evil.example",
    "",
    "/sign-in?callbackUrl=/acme",
    "/api/orgs/acme/projects",
    `/${"a".repeat(3000)}`,
  ])("refuses %j and falls back", (given) => expect(safeReturnPath(given)).toBe("/orgs"));

  it("refuses what is not a string", () => {
    expect(safeReturnPath(undefined)).toBe("/orgs");
    expect(safeReturnPath(null, "/acme")).toBe("/acme");
  });
});
