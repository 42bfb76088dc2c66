import type { Metadata } from "next";
import { requireOrg } from "@/lib/auth/page-context";
import { PriceBooksView } from "./price-books-client";

export const metadata: Metadata = { title: "Price books" };

export default async function PriceBooksPage({ params }: { params: Promise<{ orgSlug: string }> }) {
  const { orgSlug } = await params;
  const { can } = await requireOrg(orgSlug);
  return <PriceBooksView orgSlug={orgSlug} canWrite={can("priceBook.write")} />;
}
