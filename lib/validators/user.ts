import { z } from "zod";
import { passwordProblem } from "@/lib/auth/password-policy";
import { email, password, text } from "./common";

export const signUpSchema = z
  .object({
    name: text("Name", 100),
    email,
    password,
    organisationName: text("Company name", 100),
  })
  .superRefine((v, ctx) => {
    // The field's own rules ran already; this adds the one rule that needs the e-mail beside it.
    const problem = passwordProblem(v.password) === null ? passwordProblem(v.password, v.email) : null;
    if (problem) ctx.addIssue({ code: "custom", path: ["password"], message: problem });
  });
export type SignUpInput = z.infer<typeof signUpSchema>;

export const signInSchema = z.object({
  email,
  password: z.string().min(1, "Password is required.").max(200, "Password must be at most 200 characters."),
});
