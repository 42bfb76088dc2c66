import { findSettings, writeSettings } from "@/db/queries/settings";
import { FALLBACK_TRIM_SPEC } from "@/lib/plans/default-trim";
import { DEFAULT_TAKEOFF_SETTINGS } from "@/lib/takeoffs/settings";
import type { SettingsInput } from "@/lib/validators/settings";

/** The organisation's defaults as in effect (its own where set, else the product's), and whether each is its own. */
export async function getSettings({ orgId }: { orgId: string }) {
  const row = await findSettings({ orgId });
  return {
    trimDefaults: row.trimDefaults ?? FALLBACK_TRIM_SPEC,
    trimDefaultsOwn: !!row.trimDefaults,
    kerf: row.takeoff?.kerf ?? DEFAULT_TAKEOFF_SETTINGS.kerf,
    wastePercent: row.takeoff?.wastePercent ?? DEFAULT_TAKEOFF_SETTINGS.wastePercent,
  };
}

export async function updateSettings({ orgId }: { orgId: string }, input: SettingsInput) {
  const current = await getSettings({ orgId });
  await writeSettings(
    { orgId },
    {
      ...(input.trimDefaults !== undefined ? { trimDefaults: input.trimDefaults } : {}),
      takeoff: { kerf: input.kerf ?? current.kerf, wastePercent: input.wastePercent ?? current.wastePercent },
    },
  );
  return getSettings({ orgId });
}
