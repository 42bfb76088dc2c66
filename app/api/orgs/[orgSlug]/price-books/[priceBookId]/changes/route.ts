// GET /api/orgs/[orgSlug]/price-books/[priceBookId]/changes — the book's change log, newest first (?limit=N, at most 500)
import { NextResponse } from "next/server";
import { listPriceBookChanges } from "@/lib/server/price-books/changes";
import { withOrg } from "@/lib/api/with-org";
import { parseId } from "@/lib/api/read-input";
import { invalid } from "@/lib/errors";

type Params = { orgSlug: string; priceBookId: string };

export const GET = withOrg<Params>(
  async ({ req, params, org }) => {
    const priceBookId = parseId(params.priceBookId, "price book");
    const raw = req.nextUrl.searchParams.get("limit");
    const limit = raw === null ? undefined : Number(raw);
    if (limit !== undefined && !(Number.isInteger(limit) && limit >= 1 && limit <= 500)) throw invalid({ limit: "Limit must be a whole number from 1 to 500." });
    return NextResponse.json({ changes: await listPriceBookChanges({ orgId: org.orgId, priceBookId, limit }) });
  },
  { permission: "priceBook.read" },
);
