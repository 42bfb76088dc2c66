import type { LabourRates } from "@/takeoff";

/**
 * The labour rates per opening kind, beside the per-style minutes: one list the validator, the form, the
 * change log and the read-only view all take their keys and words from. Each is optional (blank in the
 * form): price books written before opening kinds have none, and the engine says what an absent one means.
 */
export const KIND_RATES = [
  { key: "minutesPerDoorSide", draft: "doorSide", label: "Door side", hint: "minutes per side cased; blank: a picture-frame opening's", log: "minutes per door side" },
  { key: "minutesPerMull", draft: "mull", label: "Mull", hint: "minutes added per mull of a mulled unit or bay", log: "minutes per mull" },
  { key: "minutesArchPremium", draft: "arch", label: "Arched head", hint: "minutes added per round-top or segment head", log: "minutes added for an arched head" },
  { key: "minutesPerBayCorner", draft: "bayCorner", label: "Bay corner", hint: "minutes added per corner of a bay or bow", log: "minutes per bay corner" },
] as const satisfies readonly { key: keyof LabourRates; draft: string; label: string; hint: string; log: string }[];

export type KindRateKey = (typeof KIND_RATES)[number]["key"];
export type KindRateDraftKey = (typeof KIND_RATES)[number]["draft"];
