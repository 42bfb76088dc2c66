import { cache } from "react";
import { notFound } from "next/navigation";
import { requireOrg } from "@/lib/auth/page-context";
import { AppError } from "@/lib/errors";
import { isUuid } from "@/lib/ids";
import { sheetOf } from "@/lib/server/plans/sheets";

/**
 * The sheet for this page, read once per request by the layout (which answers 404 before anything streams, so the
 * status stays 404 despite the loading state) and by the page. Another organisation's sheet, or another project's,
 * is the same 404 as one that does not exist.
 */
export const loadSheet = cache(async (orgSlug: string, projectId: string, sheetId: string) => {
  const { org, can } = await requireOrg(orgSlug);
  if (!isUuid(projectId) || !isUuid(sheetId)) notFound();
  const sheet = await sheetOf({ orgId: org.orgId, projectId }, sheetId).catch((e) => {
    if (e instanceof AppError && e.status === 404) notFound();
    throw e;
  });
  return { sheet, canWrite: can("plans.write") };
});
