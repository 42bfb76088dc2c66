import { z } from "zod";
import { roleEnum } from "@/db/schema";
import { email, text } from "./common";

export const roleSchema = z.enum(roleEnum.enumValues, { error: "Choose admin, estimator or project manager." });

export const inviteSchema = z.object({ email, role: roleSchema });
export const changeRoleSchema = z.object({ role: roleSchema });

/**
 * Accepting an invitation: a new person gives name + password; an existing account gives its password. Which
 * one it is depends on the invitation, so the rules for a chosen password are applied by the route.
 */
export const acceptInviteSchema = z.object({
  token: z.string().min(1, "The invitation link is incomplete.").max(200, "The invitation link is not valid."),
  name: text("Name", 100).optional(),
  password: z.string({ error: "Password is required." }).min(1, "Password is required.").max(200, "Password must be at most 200 characters."),
});
