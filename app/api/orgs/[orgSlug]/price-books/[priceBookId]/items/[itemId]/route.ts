// PATCH /api/orgs/[orgSlug]/price-books/[priceBookId]/items/[itemId] — edit a material (version-checked); DELETE ?version=N
import { NextResponse } from "next/server";
import { deletePriceBookItem, updatePriceBookItem } from "@/lib/server/price-books/items";
import { withOrg } from "@/lib/api/with-org";
import { parseId, readJson, readVersion } from "@/lib/api/read-input";
import { priceBookItemUpdateSchema } from "@/lib/validators/price-books";

type Params = { orgSlug: string; priceBookId: string; itemId: string };

const scopeOf = (org: { orgId: string; userId: string }, params: Params) => ({
  orgId: org.orgId,
  userId: org.userId,
  priceBookId: parseId(params.priceBookId, "price book"),
});

export const PATCH = withOrg<Params>(
  async ({ req, params, org }) => {
    const scope = scopeOf(org, params);
    const itemId = parseId(params.itemId, "item");
    return NextResponse.json({ item: await updatePriceBookItem(scope, itemId, await readJson(req, priceBookItemUpdateSchema)) });
  },
  { permission: "priceBook.write" },
);

export const DELETE = withOrg<Params>(
  async ({ req, params, org }) => {
    await deletePriceBookItem(scopeOf(org, params), parseId(params.itemId, "item"), readVersion(req));
    return new NextResponse(null, { status: 204 });
  },
  { permission: "priceBook.write" },
);
