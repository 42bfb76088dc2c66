import { z } from "zod";
import { projectStatusEnum } from "@/db/schema";
import { optionalText, text } from "./common";

const bidDue = z
  .union([
    z.iso.date("Bid due date must be a date (YYYY-MM-DD)."),
    z.literal("").transform(() => null),
    z.null(),
  ])
  .optional();

export const projectStatusSchema = z.enum(projectStatusEnum.enumValues, {
  error: "Status must be draft, submitted, won or lost.",
});

export const createProjectSchema = z.object({
  name: text("Project name", 160),
  generalContractor: optionalText("General contractor", 160),
  bidDue,
});
export type CreateProjectInput = z.infer<typeof createProjectSchema>;

export const updateProjectSchema = z
  .object({
    name: text("Project name", 160).optional(),
    generalContractor: optionalText("General contractor", 160),
    bidDue,
    status: projectStatusSchema.optional(),
    archived: z.boolean({ error: "Archived must be true or false." }).optional(),
  })
  .strict()
  .refine((v) => Object.keys(v).length > 0, { message: "Nothing to change.", path: ["_"] });
export type UpdateProjectInput = z.infer<typeof updateProjectSchema>;
