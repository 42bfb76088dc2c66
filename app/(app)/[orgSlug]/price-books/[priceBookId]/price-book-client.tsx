"use client";

import Link from "next/link";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useMemo, useState } from "react";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { AddLength } from "@/components/price-books/add-length";
import { ChangeLog } from "@/components/price-books/change-log";
import { CsvImport } from "@/components/price-books/csv-import";
import { ItemsContext } from "@/components/price-books/items-context";
import { ItemsTable } from "@/components/price-books/items-table";
import { NewItemForm } from "@/components/price-books/new-item-form";
import { RatesForm } from "@/components/price-books/rates-form";
import { usePriceBook } from "@/components/price-books/use-price-book";
import { request } from "@/lib/client/fetch";
import { priceBooksKey } from "@/lib/client/price-books";
import { stockLengths } from "@/lib/price-books/csv";
import { sameLength, stockLengthText } from "@/lib/price-books/length-text";

export function PriceBookView({ orgSlug, priceBookId, canWrite }: { orgSlug: string; priceBookId: string; canWrite: boolean }) {
  const { base, book, changes, controls, putItem, putBook, reload, logged } = usePriceBook(orgSlug, priceBookId, canWrite);
  const router = useRouter();
  const queryClient = useQueryClient();
  const [extra, setExtra] = useState<number[]>([]);
  const data = book.data;
  const items = useMemo(() => data?.items ?? [], [data]);
  // Columns are rebuilt only when the set of lengths changes, not on every edit of a price.
  const key = [...stockLengths(items), ...extra.filter((l) => !items.some((i) => i.stock.some((s) => sameLength(s.length, l))))].sort((a, b) => a - b).join(",");
  const lengths = useMemo(() => (key ? key.split(",").map(Number) : []), [key]);
  // Added columns live only in this page until a price is typed in them (a length is stored with its price).
  const unsaved = extra.filter((l) => !items.some((i) => i.stock.some((s) => sameLength(s.length, l))));

  const remove = useMutation({
    mutationFn: () => request<void>(`${base}?version=${data?.version}`, { method: "DELETE" }),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: priceBooksKey(orgSlug) });
      router.push(`/${orgSlug}/price-books`);
    },
    onError: () => reload(),
  });

  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <Link href={`/${orgSlug}/price-books`} className="text-sm text-spruce-700 underline">
            ← Price books
          </Link>
          <h1 className="mt-1 text-2xl font-bold">{data?.name ?? "Price book"}</h1>
        </div>
        {data && (
          <div className="flex flex-wrap gap-2">
            <a href={`${base}/csv`} download className="inline-flex items-center gap-2 rounded-md border border-graphite-400 bg-white px-3.5 py-2 text-sm font-semibold text-graphite-900 hover:bg-maple-100">
              <span aria-hidden>⤓</span> Export CSV
            </a>
            {canWrite && (
              <Button
                look="danger"
                disabled={remove.isPending}
                onClick={() => {
                  if (confirm(`Delete the price book "${data.name}" and its ${items.length} items? The change log keeps a record.`)) remove.mutate();
                }}
              >
                Delete price book
              </Button>
            )}
          </div>
        )}
      </div>
      {book.isError && <Notice tone="error">{book.error.message}</Notice>}
      {remove.isError && <Notice tone="error">{remove.error.message}</Notice>}
      {book.isPending && <p className="text-sm text-graphite-600">Loading the price book…</p>}
      {data && (
        <>
          <RatesForm
            base={base}
            book={data}
            canWrite={canWrite}
            onSaved={(b) => {
              putBook(b);
              logged();
            }}
          />
          <Card title={`Materials (${items.length})`}>
            <ItemsContext value={controls}>
              <div className="space-y-3">
                {items.length === 0 ? (
                  <p className="rounded-lg border border-dashed border-maple-300 bg-white p-6 text-sm text-graphite-700">
                    No materials yet.{canWrite ? " Add them below, or import a CSV." : ""}
                  </p>
                ) : (
                  <ItemsTable items={items} lengths={lengths} />
                )}
                <p className="text-xs text-graphite-600">
                  Prices are per piece of each stock length.
                  {canWrite
                    ? ` Click a value to change it; type lengths as you would write them (2 1/2, 11/16", 70 mm). Empty a price to stop selling that length. Enter saves, Esc cancels.`
                    : " Your role can read this price book; admins change it."}
                </p>
                {unsaved.length > 0 && (
                  <Notice>
                    {unsaved.map((l) => stockLengthText(l)).join(", ")} {unsaved.length === 1 ? "is a new column" : "are new columns"} with no prices yet: a column is kept only once
                    an item has a price in it, so type at least one price before you leave or reload this page.
                  </Notice>
                )}
                {canWrite && items.length > 0 && <AddLength lengths={lengths} onAdd={(l) => setExtra((e) => [...e, l])} />}
              </div>
            </ItemsContext>
          </Card>
          {canWrite && (
            <NewItemForm
              base={base}
              onAdded={(item) => {
                putItem(item);
                logged();
              }}
            />
          )}
          {canWrite && <CsvImport base={base} onApplied={reload} />}
          <ChangeLog changes={changes.data} error={changes.error} />
        </>
      )}
    </div>
  );
}
