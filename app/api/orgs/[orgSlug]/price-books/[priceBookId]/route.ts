// GET /api/orgs/[orgSlug]/price-books/[priceBookId] — the book with its items; PATCH — name, rates, markup, tax (version-checked); DELETE ?version=N
import { NextResponse } from "next/server";
import { deletePriceBook, getPriceBook, updatePriceBook } from "@/lib/server/price-books/books";
import { withOrg } from "@/lib/api/with-org";
import { parseId, readJson, readVersion } from "@/lib/api/read-input";
import { priceBookUpdateSchema } from "@/lib/validators/price-books";

type Params = { orgSlug: string; priceBookId: string };

export const GET = withOrg<Params>(
  async ({ params, org }) => NextResponse.json({ priceBook: await getPriceBook({ orgId: org.orgId, priceBookId: parseId(params.priceBookId, "price book") }) }),
  { permission: "priceBook.read" },
);

export const PATCH = withOrg<Params>(
  async ({ req, params, org }) => {
    const scope = { orgId: org.orgId, userId: org.userId, priceBookId: parseId(params.priceBookId, "price book") };
    return NextResponse.json({ priceBook: await updatePriceBook(scope, await readJson(req, priceBookUpdateSchema)) });
  },
  { permission: "priceBook.write" },
);

export const DELETE = withOrg<Params>(
  async ({ req, params, org }) => {
    const scope = { orgId: org.orgId, userId: org.userId, priceBookId: parseId(params.priceBookId, "price book") };
    await deletePriceBook(scope, readVersion(req));
    return new NextResponse(null, { status: 204 });
  },
  { permission: "priceBook.write" },
);
