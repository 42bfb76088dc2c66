import { findSettings, writeSettings } from "@/db/queries/settings";
import { FALLBACK_TRIM_SPEC } from "@/lib/plans/default-trim";
import { DEFAULT_SCARF_OVERLAP, DEFAULT_TAKEOFF_SETTINGS } from "@/lib/takeoffs/settings";
import { PLAN_SECONDS, type SettingsInput } from "@/lib/validators/settings";
import type { TakeoffSettings } from "@/takeoff";

/**
 * The organisation's defaults as in effect (its own where set, else the product's), and whether each is its own.
 * `ripKerf` is null while the company has set none: rips then take the saw kerf.
 */
export async function getSettings({ orgId }: { orgId: string }) {
  const row = await findSettings({ orgId });
  return {
    trimDefaults: row.trimDefaults ?? FALLBACK_TRIM_SPEC,
    trimDefaultsOwn: !!row.trimDefaults,
    kerf: row.takeoff?.kerf ?? DEFAULT_TAKEOFF_SETTINGS.kerf,
    wastePercent: row.takeoff?.wastePercent ?? DEFAULT_TAKEOFF_SETTINGS.wastePercent,
    ripKerf: row.takeoff?.ripKerf ?? null,
    planSeconds: row.takeoff?.planSeconds ?? PLAN_SECONDS.default,
    scarfOverlap: row.takeoff?.scarfOverlap ?? DEFAULT_SCARF_OVERLAP,
  };
}

/** A field absent from the input keeps what is stored; null clears it back to the default. */
export async function updateSettings({ orgId }: { orgId: string }, input: SettingsInput) {
  const row = await findSettings({ orgId });
  const current = row.takeoff;
  const ripKerf = input.ripKerf === undefined ? current?.ripKerf : (input.ripKerf ?? undefined);
  const planSeconds = input.planSeconds === undefined ? current?.planSeconds : (input.planSeconds ?? undefined);
  const scarfOverlap = input.scarfOverlap === undefined ? current?.scarfOverlap : (input.scarfOverlap ?? undefined);
  const takeoff: TakeoffSettings = {
    kerf: input.kerf ?? current?.kerf ?? DEFAULT_TAKEOFF_SETTINGS.kerf,
    wastePercent: input.wastePercent ?? current?.wastePercent ?? DEFAULT_TAKEOFF_SETTINGS.wastePercent,
    ...(ripKerf !== undefined ? { ripKerf } : {}),
    ...(planSeconds !== undefined ? { planSeconds } : {}),
    ...(scarfOverlap !== undefined ? { scarfOverlap } : {}),
  };
  await writeSettings({ orgId }, { ...(input.trimDefaults !== undefined ? { trimDefaults: input.trimDefaults } : {}), takeoff });
  return getSettings({ orgId });
}
