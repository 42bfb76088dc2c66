import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { getTakeoff } from "@/lib/server/takeoffs/takeoffs";
import { requireOrg } from "@/lib/auth/page-context";
import { AppError } from "@/lib/errors";
import { isUuid } from "@/lib/ids";
import { crewCutList } from "@/lib/takeoffs/crew-cut-list";
import { tapeLength } from "@/lib/takeoffs/format";
import { endsText, PART_LABELS, STYLE_NAMES } from "@/lib/takeoffs/labels";
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
            <div key={w.mark} className="break-inside-avoid">
              <h3 className="font-semibold">
                {w.mark} · {tapeLength(w.size.width)} × {tapeLength(w.size.height)} · {STYLE_NAMES[w.style as keyof typeof STYLE_NAMES]} · {w.perUnit} per unit
                {g.units > 1 ? `, ${w.total} in all` : ""}
              </h3>
              <table className="mt-1 w-full border-collapse text-sm">
                <thead className="border-b border-graphite-400 text-left">
                  <tr>
                    <th className="py-1 pr-2 font-medium">Piece</th>
                    <th className="num py-1 pr-2 font-medium">Length</th>
                    <th className="num py-1 pr-2 font-medium">Width</th>
                    <th className="py-1 pr-2 font-medium">Ends</th>
                    <th className="num py-1 pr-2 font-medium">Per window</th>
                    <th className="num py-1 pr-2 font-medium">Per unit</th>
                    {g.units > 1 && <th className="num py-1 font-medium">All units</th>}
                  </tr>
                </thead>
                <tbody>
                  {w.pieces.map((p) => (
                    <tr key={p.part} className="border-b border-maple-200">
                      <td className="py-1 pr-2">{PART_LABELS[p.part]}</td>
                      <td className="num py-1 pr-2 font-semibold">{tapeLength(p.length)}</td>
                      <td className="num py-1 pr-2">{p.width === undefined ? "" : tapeLength(p.width)}</td>
                      <td className="py-1 pr-2">{endsText(p.ends)}</td>
                      <td className="num py-1 pr-2">{p.quantity}</td>
                      <td className="num py-1 pr-2">{p.perUnit}</td>
                      {g.units > 1 && <td className="num py-1">{p.total}</td>}
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          ))}
        </section>
      ))}
    </article>
  );
}
