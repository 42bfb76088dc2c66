import type { NextRequest } from "next/server";
import { invalid } from "@/lib/errors";
import { confirmTagsParam } from "@/lib/validators/plans";

/** `?tags=N` on a DELETE: the tag count the person agreed to remove with it, or undefined when not given. */
export function readConfirmedTags(req: NextRequest): number | undefined {
  const raw = req.nextUrl.searchParams.get("tags");
  if (raw === null) return undefined;
  const parsed = confirmTagsParam.safeParse(raw);
  if (!parsed.success) throw invalid({ tags: parsed.error.issues[0]?.message ?? "Give ?tags=N." });
  return parsed.data;
}
