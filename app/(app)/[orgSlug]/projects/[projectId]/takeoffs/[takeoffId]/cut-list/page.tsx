import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { getTakeoff } from "@/lib/server/takeoffs/takeoffs";
import { requireOrg } from "@/lib/auth/page-context";
import { AppError } from "@/lib/errors";
import { isUuid } from "@/lib/ids";
import { crewCutList } from "@/lib/takeoffs/crew-cut-list";
import { CrewCutListTable } from "@/components/takeoffs/crew-cut-list-table";
import { PrintButton } from "@/components/takeoffs/print-button";
import { RippingPlan } from "@/components/takeoffs/ripping-plan";
import { SafetyCautions } from "@/components/takeoff-actions/safety-cautions";

export const metadata: Metadata = { title: "Cut list" };

/**
 * The installers' cut list, printable on letter paper, with the shop-floor cautions first; boards ripped to
 * several strip widths get their ripping and cutting plan (with the table-saw cautions) before the pieces.
 */
export default async function CutListPage({ params }: { params: Promise<{ orgSlug: string; projectId: string; takeoffId: string }> }) {
  const { orgSlug, projectId, takeoffId } = await params;
  const { org } = await requireOrg(orgSlug);
  if (!isUuid(projectId) || !isUuid(takeoffId)) notFound();
  const t = await getTakeoff({ orgId: org.orgId, projectId }, takeoffId).catch((e) => {
    if (e instanceof AppError && e.status === 404) notFound();
    throw e;
  });
  const groups = crewCutList(t.inputs, t.result);
  return (
    <article className="space-y-6 print:text-[10pt]">
      <style>{"@page { size: letter; margin: 0.5in } @media print { header, nav { display: none !important } }"}</style>
      <div className="flex flex-wrap items-center justify-between gap-3 print:hidden">
        <Link href={`/${orgSlug}/projects/${projectId}/takeoffs/${t.id}`} className="text-sm text-spruce-700 underline">
          ← {t.name}
        </Link>
        <PrintButton />
      </div>
      <h1 className="text-2xl font-bold">Cut list — {t.name}</h1>
      <SafetyCautions />
      <RippingPlan orders={t.result.orders} />
      {groups.map((g) => (
        <section key={g.title} className="space-y-3 break-inside-avoid-page">
          <h2 className="text-xl font-bold">
            {g.title} {g.units > 1 && <span className="text-base font-normal text-graphite-600">— {g.units} units; quantities per unit and for all {g.units}</span>}
          </h2>
          {g.windows.map((w) => (
            <CrewCutListTable key={w.mark} w={w} units={g.units} opening={((o) => o && (o.kindOpening ?? o.opening))(t.result.openingTypes.find((o) => o.mark === w.mark))} />
          ))}
        </section>
      ))}
    </article>
  );
}
