import { eq } from "drizzle-orm";
import { db } from "../client";
import { organisations } from "../schema";
import { FALLBACK_TRIM_SPEC } from "@/lib/plans/default-trim";
import { DEFAULT_TAKEOFF_SETTINGS } from "@/lib/takeoffs/settings";
import type { SettingsInput } from "@/lib/validators/settings";

/** The organisation's defaults as in effect (its own where set, else the product's), and whether each is its own. */
export async function getSettings({ orgId }: { orgId: string }) {
  const [row] = await db
    .select({ trimDefaults: organisations.trimDefaults, takeoff: organisations.takeoffSettings })
    .from(organisations)
    .where(eq(organisations.id, orgId));
  return {
    trimDefaults: row?.trimDefaults ?? FALLBACK_TRIM_SPEC,
    trimDefaultsOwn: !!row?.trimDefaults,
    kerf: row?.takeoff?.kerf ?? DEFAULT_TAKEOFF_SETTINGS.kerf,
    wastePercent: row?.takeoff?.wastePercent ?? DEFAULT_TAKEOFF_SETTINGS.wastePercent,
  };
}

export async function updateSettings({ orgId }: { orgId: string }, input: SettingsInput) {
  const current = await getSettings({ orgId });
  await db
    .update(organisations)
    .set({
      ...(input.trimDefaults !== undefined ? { trimDefaults: input.trimDefaults } : {}),
      takeoffSettings: { kerf: input.kerf ?? current.kerf, wastePercent: input.wastePercent ?? current.wastePercent },
    })
    .where(eq(organisations.id, orgId));
  return getSettings({ orgId });
}
