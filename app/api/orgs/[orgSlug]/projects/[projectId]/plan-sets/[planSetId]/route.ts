// DELETE /api/orgs/[orgSlug]/projects/[projectId]/plan-sets/[planSetId] — remove a plan set, its sheets, tags and file (?tags=N: the tag count the person agreed to remove)
import { NextResponse } from "next/server";
import { deletePlanSet } from "@/db/queries/plan-sets";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";
import { readConfirmedTags } from "@/lib/api/read-confirm";
import { parseId } from "@/lib/api/read-input";
import { deleteStoredFiles } from "@/lib/uploads/file-store";

type Params = { orgSlug: string; projectId: string; planSetId: string };

export const DELETE = withOrg<Params>(
  async ({ req, params, org }) => {
    const fileKey = await deletePlanSet(projectScope(org, params), parseId(params.planSetId, "plan set"), readConfirmedTags(req));
    // The rows are gone already; a storage hiccup leaves an orphan file, never a sheet without a file.
    await deleteStoredFiles([fileKey]).catch((error) => console.error("could not delete stored file", fileKey, error));
    return new NextResponse(null, { status: 204 });
  },
  { permission: "plans.write" },
);
