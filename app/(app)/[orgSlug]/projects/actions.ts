"use server";

import { createProject } from "@/lib/server/projects/projects";
import { orgAction } from "@/lib/actions/org-action";
import { createProjectSchema } from "@/lib/validators/project";

/** New-project form: works without client JavaScript too, through useActionState. */
export const createProjectAction = orgAction(
  { permission: "project.write", schema: createProjectSchema },
  async (input, org) => {
    const project = await createProject({ orgId: org.orgId, userId: org.userId, input });
    return { id: project.id, name: project.name };
  },
);
