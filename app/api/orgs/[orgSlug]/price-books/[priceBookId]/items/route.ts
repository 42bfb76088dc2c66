// POST /api/orgs/[orgSlug]/price-books/[priceBookId]/items — add a material to the book
import { NextResponse } from "next/server";
import { createPriceBookItem } from "@/lib/server/price-books/items";
import { withOrg } from "@/lib/api/with-org";
import { parseId, readJson } from "@/lib/api/read-input";
import { priceBookItemCreateSchema } from "@/lib/validators/price-books";

type Params = { orgSlug: string; priceBookId: string };

export const POST = withOrg<Params>(
  async ({ req, params, org }) => {
    const scope = { orgId: org.orgId, userId: org.userId, priceBookId: parseId(params.priceBookId, "price book") };
    const item = await createPriceBookItem(scope, await readJson(req, priceBookItemCreateSchema));
    return NextResponse.json({ item }, { status: 201 });
  },
  { permission: "priceBook.write" },
);
