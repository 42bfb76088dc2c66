"use client";

import { useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { Notice } from "@/components/ui/card";
import { RunTakeoffForm, type CasingChoice, type PriceBookChoice } from "@/components/takeoffs/run-takeoff-form";
import { TakeoffList } from "@/components/takeoffs/takeoff-list";
import { takeoffsQuery } from "@/lib/client/takeoffs";
import { takeoffsPage } from "@/lib/takeoffs/view";

export function TakeoffsView({
  orgSlug,
  projectId,
  canRun,
  canManagePriceBooks,
  priceBooks,
  casings,
}: {
  orgSlug: string;
  projectId: string;
  canRun: boolean;
  canManagePriceBooks: boolean;
  priceBooks: PriceBookChoice[];
  casings: CasingChoice[];
}) {
  const scope = { orgSlug, projectId };
  const list = useQuery(takeoffsQuery(scope));
  const takeoffs = list.data;

  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-bold">Takeoffs</h1>
        <p className="mt-1 text-sm text-graphite-700">
          Each takeoff is a saved snapshot of the window list priced from one price book: cut lists, board order and bid.
        </p>
      </div>
      {list.isError && <Notice tone="error">{list.error.message}</Notice>}
      {list.isPending && <p className="text-sm text-graphite-600">Loading takeoffs…</p>}
      {takeoffs && takeoffs.length === 0 && (
        <p className="rounded-lg border border-dashed border-maple-300 bg-white p-6 text-sm text-graphite-700">
          No takeoffs yet.
          {canRun ? (priceBooks.length > 0 ? " Run the first one below once the window list is tagged." : "") : " Estimators and admins run them."}
        </p>
      )}
      {takeoffs && takeoffs.length > 0 && (
        <TakeoffList
          takeoffs={takeoffs}
          pageBase={takeoffsPage(orgSlug, projectId)}
          edit={canRun ? scope : undefined}
        />
      )}
      {canRun && priceBooks.length === 0 && (
        <Notice>
          Your organisation has no price book yet, and a takeoff is priced from one.{" "}
          {canManagePriceBooks ? (
            <Link href={`/${orgSlug}/price-books`} className="font-semibold text-spruce-700 underline">
              Set up a price book
            </Link>
          ) : (
            "Ask an admin to set one up."
          )}
        </Notice>
      )}
      {canRun && priceBooks.length > 0 && <RunTakeoffForm orgSlug={orgSlug} projectId={projectId} priceBooks={priceBooks} casings={casings} />}
      {!canRun && <p className="text-xs text-graphite-600">Your role can read takeoffs; estimators and admins run them.</p>}
    </div>
  );
}
