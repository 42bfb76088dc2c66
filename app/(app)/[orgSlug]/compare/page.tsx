import type { Metadata } from "next";
import { getTakeoffsToCompare, listOrganisationTakeoffs } from "@/lib/server/takeoffs/compare";
import { requireOrg } from "@/lib/auth/page-context";
import { toAppError } from "@/lib/errors";
import { column, explainDifferences } from "@/lib/takeoffs/compare";
import { Card, Notice } from "@/components/ui/card";
import { ComparisonTable } from "@/components/compare/comparison-table";
import { TakeoffPicker } from "@/components/compare/takeoff-picker";
import { isUuid } from "@/lib/ids";

export const metadata: Metadata = { title: "Compare takeoffs" };


export default async function ComparePage({ params, searchParams }: { params: Promise<{ orgSlug: string }>; searchParams: Promise<{ ids?: string | string[] }> }) {
  const { orgSlug } = await params;
  const { org } = await requireOrg(orgSlug);
  const raw = (await searchParams).ids;
  const ids = [...new Set((Array.isArray(raw) ? raw : raw ? raw.split(",") : []).filter((id) => isUuid(id)))];
  const all = await listOrganisationTakeoffs(org.orgId);

  let comparison: { columns: ReturnType<typeof column>[]; reasons: string[][] } | null = null;
  let problem: string | null = null;
  if (ids.length > 4) problem = "Pick at most four takeoffs.";
  // One ticked box used to compare nothing and say nothing.
  else if (ids.length === 1) problem = "Tick at least one more takeoff to compare with it: a comparison needs two to four.";
  else if (ids.length >= 2) {
    try {
      const list = await getTakeoffsToCompare(org.orgId, ids);
      comparison = { columns: list.map(column), reasons: list.map((t, i) => (i === 0 ? [] : explainDifferences(list[0]!, t))) };
    } catch (error) {
      problem = toAppError(error)?.message ?? "Those takeoffs could not be compared.";
    }
  }

  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-bold">Compare takeoffs</h1>
      {problem && <Notice tone="error">{problem}</Notice>}
      {comparison && <ComparisonTable columns={comparison.columns} reasons={comparison.reasons} />}
      <Card title="Pick two to four takeoffs">
        <TakeoffPicker takeoffs={all.map((t) => ({ ...t, createdAt: t.createdAt.toISOString() }))} selected={ids} />
      </Card>
    </div>
  );
}
