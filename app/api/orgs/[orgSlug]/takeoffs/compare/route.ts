// GET /api/orgs/[orgSlug]/takeoffs/compare?ids=a,b[,c,d] — two to four takeoffs side by side, with what changed
import { NextResponse } from "next/server";
import { z } from "zod";
import { getTakeoffsToCompare } from "@/lib/server/takeoffs/compare";
import { withOrg } from "@/lib/api/with-org";
import { fieldErrors, invalid } from "@/lib/errors";
import { column, explainDifferences } from "@/lib/takeoffs/compare";

const idsSchema = z
  .string({ error: "Pick two to four takeoffs." })
  .transform((s) => s.split(",").map((x) => x.trim()).filter(Boolean))
  .pipe(z.array(z.uuid("Not a valid takeoff id.")).min(2, "Pick two to four takeoffs.").max(4, "Pick two to four takeoffs."))
  .refine((ids) => new Set(ids).size === ids.length, "Pick each takeoff once.");

export const GET = withOrg(
  async ({ req, org }) => {
    const parsed = idsSchema.safeParse(req.nextUrl.searchParams.get("ids") ?? undefined);
    if (!parsed.success) throw invalid({ ids: Object.values(fieldErrors(parsed.error))[0] ?? "Pick two to four takeoffs." });
    const list = await getTakeoffsToCompare(org.orgId, parsed.data);
    const [base, ...rest] = list;
    return NextResponse.json({
      columns: list.map(column),
      differences: rest.map((t) => ({ id: t.id, against: base!.id, reasons: explainDifferences(base!, t) })),
    });
  },
  { permission: "takeoff.read" },
);
