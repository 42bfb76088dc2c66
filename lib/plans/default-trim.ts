import type { TrimSpec } from "@/takeoff";

/**
 * Where a new opening type's trim spec starts when the organisation has set none: stool-and-apron
 * with 2 1/2 in × 11/16 in casing, a stock flat/colonial size at lumber yards (common practice).
 * Reveal, horn, projection and extension thickness fall to the engine's own defaults.
 */
export const FALLBACK_TRIM_SPEC: TrimSpec = { style: "stool-and-apron", casingWidth: 2.5, casingThickness: 0.6875 };
