// GET /api/orgs/[orgSlug]/projects/[projectId]/price-gaps[?priceBookId=…] — what the window list needs that the price book lacks
import { NextResponse } from "next/server";
import { listPriceGaps } from "@/lib/server/takeoffs/price-gaps";
import { withOrg } from "@/lib/api/with-org";
import { projectScope } from "@/lib/api/project-scope";
import { invalid } from "@/lib/errors";
import { isUuid } from "@/lib/ids";

type Params = { orgSlug: string; projectId: string };

export const GET = withOrg<Params>(
  async ({ req, params, org }) => {
    const raw = req.nextUrl.searchParams.get("priceBookId");
    if (raw !== null && !isUuid(raw)) throw invalid({ priceBookId: "No such price book." });
    return NextResponse.json(await listPriceGaps(projectScope(org, params), raw ?? undefined));
  },
  { permission: "plans.read" },
);
