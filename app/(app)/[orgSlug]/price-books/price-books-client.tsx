"use client";

import Link from "next/link";
import { useQuery } from "@tanstack/react-query";
import { Card, Notice } from "@/components/ui/card";
import { NewPriceBookForm } from "@/components/price-books/new-price-book-form";
import { formatMoney, percentText } from "@/lib/price-books/numbers";
import { priceBooksQuery } from "@/lib/client/price-books";

const updated = new Intl.DateTimeFormat("en-US", { dateStyle: "medium" });

export function PriceBooksView({ orgSlug, canWrite }: { orgSlug: string; canWrite: boolean }) {
  const query = useQuery(priceBooksQuery(orgSlug));

  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_20rem]">
      <Card title="Price books">
        <p className="mb-3 text-sm text-graphite-700">
          Material prices by stock length, labour rates, markup and tax.{canWrite ? "" : " Your role can read price books; admins change them."}
        </p>
        {query.isPending && <p className="text-sm text-graphite-600">Loading price books…</p>}
        {query.isError && <Notice tone="error">{query.error.message}</Notice>}
        {query.data && query.data.length === 0 && (
          <p className="text-sm text-graphite-600">No price books yet.{canWrite ? " Create the first one." : ""}</p>
        )}
        {query.data && query.data.length > 0 && (
          <div className="overflow-x-auto">
            <table className="w-full text-sm">
              <thead className="border-b border-maple-200 text-left text-graphite-600">
                <tr>
                  <th className="py-2 pr-3 font-medium">Price book</th>
                  <th className="py-2 pr-3 text-right font-medium">Items</th>
                  <th className="py-2 pr-3 text-right font-medium">Labour</th>
                  <th className="py-2 pr-3 text-right font-medium">Markup</th>
                  <th className="py-2 pr-3 text-right font-medium">Tax</th>
                  <th className="py-2 text-right font-medium">Updated</th>
                </tr>
              </thead>
              <tbody>
                {query.data.map((b) => (
                  <tr key={b.id} className="border-b border-maple-100 last:border-0">
                    <td className="py-2 pr-3">
                      <Link href={`/${orgSlug}/price-books/${b.id}`} className="font-medium text-spruce-700 underline-offset-2 hover:underline">
                        {b.name}
                      </Link>
                    </td>
                    <td className="num py-2 pr-3">{b.itemCount}</td>
                    <td className="num py-2 pr-3">{formatMoney(b.labour.hourlyRate)}/h</td>
                    <td className="num py-2 pr-3">{percentText(b.markup)} %</td>
                    <td className="num py-2 pr-3">{percentText(b.taxRate)} %</td>
                    <td className="num py-2">{updated.format(new Date(b.updatedAt))}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </Card>
      {canWrite && <NewPriceBookForm orgSlug={orgSlug} />}
    </div>
  );
}
