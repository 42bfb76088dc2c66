import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { requireBook as getBookSummary } from "@/lib/server/price-books/book-scope";
import { requireOrg } from "@/lib/auth/page-context";
import { AppError } from "@/lib/errors";
import { PriceBookView } from "./price-book-client";
import { isUuid } from "@/lib/ids";

export const metadata: Metadata = { title: "Price book" };


export default async function PriceBookPage({ params }: { params: Promise<{ orgSlug: string; priceBookId: string }> }) {
  const { orgSlug, priceBookId } = await params;
  const { org, can } = await requireOrg(orgSlug);
  if (!isUuid(priceBookId)) notFound();
  // Another organisation's book is "not found", exactly like one that never existed.
  await getBookSummary({ orgId: org.orgId, priceBookId }).catch((e) => {
    if (e instanceof AppError && e.status === 404) notFound();
    throw e;
  });
  return <PriceBookView orgSlug={orgSlug} priceBookId={priceBookId} canWrite={can("priceBook.write")} />;
}
