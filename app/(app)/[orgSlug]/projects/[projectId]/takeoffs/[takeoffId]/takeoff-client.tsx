"use client";

import { useQuery } from "@tanstack/react-query";
import type { ReactNode } from "react";
import { BidSummary } from "@/components/takeoffs/bid-summary";
import { BoardOrderTable } from "@/components/takeoffs/board-order-table";
import { CostChart } from "@/components/takeoffs/cost-chart";
import { JobMaterials } from "@/components/takeoffs/job-materials";
import { OpeningTypeSection } from "@/components/takeoffs/opening-type-section";
import { PlaceholderNotice } from "@/components/takeoffs/placeholder-notice";
import { PrintSheet } from "@/components/takeoffs/print-sheet";
import { TakeoffHeader } from "@/components/takeoffs/takeoff-header";
import { UnitTypeTotals } from "@/components/takeoffs/unit-type-totals";
import { TakeoffActions } from "@/components/takeoff-actions/takeoff-actions";
import { takeoffQuery } from "@/lib/client/takeoffs";
import { takeoffsPage, type TakeoffDetail } from "@/lib/takeoffs/view";

function Part({ id, title, intro, children }: { id: string; title: string; intro?: string; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="space-y-3">
      <div>
        <h2 id={id} className="text-xl font-bold text-graphite-900">
          {title}
        </h2>
        {intro && <p className="text-sm text-graphite-700">{intro}</p>}
      </div>
      {children}
    </section>
  );
}

/** A saved takeoff, read-only: per opening type, per unit type, then the job's order and bid. */
export function TakeoffResultView({
  orgSlug,
  projectId,
  initial,
  canSubmit,
  canRun,
}: {
  orgSlug: string;
  projectId: string;
  initial: TakeoffDetail;
  canSubmit: boolean;
  canRun: boolean;
}) {
  // Figures never change once saved; the query only keeps the status (draft or submitted) current.
  const { data: t } = useQuery({ ...takeoffQuery({ orgSlug, projectId, takeoffId: initial.id }), initialData: initial, staleTime: 60_000 });
  const { result, prices } = t;
  return (
    <div className="space-y-8">
      <PrintSheet />
      <TakeoffHeader t={t} listHref={takeoffsPage(orgSlug, projectId)} />
      <PlaceholderNotice result={result} />
      <TakeoffActions orgSlug={orgSlug} projectId={projectId} takeoffId={t.id} status={t.status} canSubmit={canSubmit} canRun={canRun} />
      <Part id="per-opening" title="Per opening type" intro="What each window gets, as the crew cuts it.">
        <div className="space-y-4">
          {result.openingTypes.map((ot) => (
            <OpeningTypeSection key={ot.openingTypeId} ot={ot} items={prices.items} />
          ))}
        </div>
      </Part>
      <Part id="per-unit" title="Per unit type" intro="Cut lengths per material, before boards and waste.">
        <UnitTypeTotals result={result} />
      </Part>
      <Part id="per-job" title="Job totals" intro="Materials for the whole job, the boards to order and the bid.">
        <JobMaterials result={result} />
        <h3 className="pt-2 text-lg font-semibold">Board order</h3>
        <BoardOrderTable orders={result.orders} items={prices.items} settingsHref={`/${orgSlug}/settings`} planSeconds={t.inputs.settings.planSeconds} />
        <h3 className="pt-2 text-lg font-semibold">Bid</h3>
        <div className="space-y-6 rounded-lg border border-maple-200 bg-white p-4">
          <BidSummary result={result} prices={prices} />
          <CostChart result={result} />
        </div>
      </Part>
    </div>
  );
}
