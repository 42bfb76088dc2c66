import { describe, expect, it } from "vitest";
import { fieldErrors } from "@/lib/errors";
import { createProjectSchema, updateProjectSchema } from "./project";
import { settingsSchema } from "./settings";
import { signUpSchema } from "./user";

const errorsOf = (r: { success: boolean; error?: unknown }) => (r.success ? {} : fieldErrors(r.error as never));

describe("validators shared by forms and the API", () => {
  it("normalise e-mail to lower case and trim names", () => {
    const r = signUpSchema.parse({ name: "  Ada  ", email: " ADA@Example.TEST ", password: "stool and apron", organisationName: "Ada Trim" });
    expect(r).toMatchObject({ name: "Ada", email: "ada@example.test" });
  });

  it("turn an empty optional form field into null", () => {
    expect(createProjectSchema.parse({ name: "Kestrel Row", generalContractor: "", bidDue: "" })).toEqual({
      name: "Kestrel Row",
      generalContractor: null,
      bidDue: null,
    });
  });

  it.each([
    ["2027-02-29", "Bid due date must be a date (YYYY-MM-DD)."], // 2027 is not a leap year
    ["2027-13-01", "Bid due date must be a date (YYYY-MM-DD)."],
    ["tomorrow", "Bid due date must be a date (YYYY-MM-DD)."],
  ])("refuse the bid due date %s", (bidDue, message) => {
    expect(errorsOf(createProjectSchema.safeParse({ name: "X", bidDue }))).toEqual({ bidDue: message });
  });

  it("accept a leap day that exists", () => {
    expect(createProjectSchema.parse({ name: "X", bidDue: "2028-02-29" }).bidDue).toBe("2028-02-29");
  });

  it("refuse an update that names no field", () => {
    expect(errorsOf(updateProjectSchema.safeParse({}))).toEqual({ _: "Nothing to change." });
  });

  it("give a kerf's own example when it is not a length", () => {
    // It used to suggest 2'-11 1/2" for a saw kerf, and the form then showed "Saw kerf: Kerf: …".
    expect(errorsOf(settingsSchema.safeParse({ kerf: "abc" }))).toEqual({ kerf: "Kerf: write a length such as 1/8, 3/32 or 3 mm." });
    expect(errorsOf(settingsSchema.safeParse({ ripKerf: "wide" }))).toEqual({ ripKerf: "Rip kerf: write a length such as 1/8, 3/32 or 3 mm." });
  });
});
