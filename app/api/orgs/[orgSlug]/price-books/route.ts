// GET /api/orgs/[orgSlug]/price-books — the organisation's price books; POST — create one (admins)
import { NextResponse } from "next/server";
import { createPriceBook, listPriceBooks } from "@/lib/server/price-books/books";
import { withOrg } from "@/lib/api/with-org";
import { readJson } from "@/lib/api/read-input";
import { priceBookCreateSchema } from "@/lib/validators/price-books";

export const GET = withOrg(async ({ org }) => NextResponse.json({ priceBooks: await listPriceBooks({ orgId: org.orgId }) }), {
  permission: "priceBook.read",
});

export const POST = withOrg(
  async ({ req, org }) => {
    const input = await readJson(req, priceBookCreateSchema);
    const priceBook = await createPriceBook({ orgId: org.orgId, userId: org.userId, input });
    return NextResponse.json({ priceBook }, { status: 201 });
  },
  { permission: "priceBook.write" },
);
