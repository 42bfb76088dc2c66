import Link from "next/link";
import { count, usd } from "@/lib/takeoffs/format";
import type { TakeoffDetail } from "@/lib/takeoffs/view";
import { formatLengthExact } from "@/takeoff";
import { LocalTime } from "./local-time";
import { PrintButton } from "./print-button";
import { TakeoffStatus } from "./takeoff-status";

/** Name, who ran it with what prices and allowances, and the two figures everyone looks for first. */
export function TakeoffHeader({ t, listHref }: { t: TakeoffDetail; listHref: string }) {
  const { settings, casingItemId } = t.inputs;
  const alternate = casingItemId ? t.prices.items.find((i) => i.id === casingItemId) : undefined;
  return (
    <header className="space-y-3">
      <div className="flex flex-wrap items-center justify-between gap-2 print:hidden">
        <Link href={listHref} className="text-sm text-spruce-700 underline">
          ← All takeoffs
        </Link>
        <PrintButton />
      </div>
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div className="space-y-1">
          <h1 className="flex flex-wrap items-center gap-3 text-2xl font-bold">
            {t.name} <TakeoffStatus status={t.status} />
          </h1>
          {t.note && <p className="max-w-2xl text-sm text-graphite-700">{t.note}</p>}
          <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
            <dt className="text-graphite-600">Run by</dt>
            <dd>
              {t.createdByName ?? "Former member"}, <LocalTime iso={t.createdAt} />
            </dd>
            <dt className="text-graphite-600">Price book</dt>
            <dd>
              {t.prices.priceBook.name} <span className="text-graphite-600">· prices as of <LocalTime iso={t.createdAt} dateOnly /></span>
            </dd>
            <dt className="text-graphite-600">Allowances</dt>
            <dd>
              Saw kerf {formatLengthExact(settings.kerf)} · waste allowance {settings.wastePercent} % extra boards
            </dd>
            {alternate && (
              <>
                <dt className="text-graphite-600">Alternate</dt>
                <dd>Every window cased in {alternate.name}</dd>
              </>
            )}
          </dl>
        </div>
        <dl className="grid grid-cols-2 gap-3 text-right">
          <div className="rounded-lg border border-maple-200 bg-white px-4 py-2">
            <dt className="text-xs text-graphite-600">Openings</dt>
            <dd className="num text-xl font-bold">{count(t.result.openingsTotal)}</dd>
          </div>
          <div className="rounded-lg border-2 border-spruce-700 bg-white px-4 py-2">
            <dt className="text-xs text-graphite-600">Bid total</dt>
            <dd className="num text-xl font-bold">{usd(t.result.bid.total)}</dd>
          </div>
        </dl>
      </div>
      {t.status === "submitted" && (
        <p className="text-sm text-spruce-800">This takeoff was submitted as the bid{t.submittedAt ? <> on <LocalTime iso={t.submittedAt} dateOnly /></> : null}.</p>
      )}
    </header>
  );
}
