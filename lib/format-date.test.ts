import { expect, it } from "vitest";
import { formatDate } from "./format-date";

it("shows a calendar date without shifting it by the time zone", () => {
  expect(formatDate("2027-03-01")).toBe("Mar 1, 2027");
  expect(formatDate("2026-12-31")).toBe("Dec 31, 2026");
});
