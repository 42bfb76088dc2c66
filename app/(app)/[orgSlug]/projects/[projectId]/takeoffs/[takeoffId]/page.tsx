import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { getTakeoff } from "@/lib/server/takeoffs/takeoffs";
import { requireOrg } from "@/lib/auth/page-context";
import { AppError } from "@/lib/errors";
import { toDetail } from "@/lib/takeoffs/view";
import { TakeoffResultView } from "./takeoff-client";
import { isUuid } from "@/lib/ids";

export const metadata: Metadata = { title: "Takeoff" };


export default async function TakeoffPage({ params }: { params: Promise<{ orgSlug: string; projectId: string; takeoffId: string }> }) {
  const { orgSlug, projectId, takeoffId } = await params;
  const { org, can } = await requireOrg(orgSlug);
  if (!can("takeoff.read") || !isUuid(projectId) || !isUuid(takeoffId)) notFound();
  const takeoff = await getTakeoff({ orgId: org.orgId, projectId }, takeoffId).catch((e) => {
    if (e instanceof AppError && e.status === 404) notFound();
    throw e;
  });
  return (
    <TakeoffResultView
      orgSlug={orgSlug}
      projectId={projectId}
      initial={toDetail(takeoff)}
      canSubmit={can("takeoff.submit")}
      canRun={can("takeoff.run")}
    />
  );
}
