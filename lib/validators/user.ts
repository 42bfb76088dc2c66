import { z } from "zod";
import { email, password, text } from "./common";

export const signUpSchema = z.object({
  name: text("Name", 100),
  email,
  password,
  organisationName: text("Company name", 100),
});
export type SignUpInput = z.infer<typeof signUpSchema>;

export const signInSchema = z.object({
  email,
  password: z.string().min(1, "Password is required.").max(200, "Password must be at most 200 characters."),
});
