import type { CutPiece } from "@/takeoff";
import type { TakeoffInputs, TakeoffResult } from "@/takeoff";

export interface CrewGroup {
  /** "Type A" … or "Common areas". */
  title: string;
  units: number;
  windows: { mark: string; size: { width: number; height: number }; style: string; perUnit: number; total: number; pieces: (CutPiece & { perUnit: number; total: number })[] }[];
}

/**
 * The crew's cut list, the way a crew works: by unit type (one unit's windows, then × the number of
 * units), then by window type; common areas once. Built from the saved takeoff, never from live data.
 */
export function crewCutList(inputs: TakeoffInputs, result: TakeoffResult): CrewGroup[] {
  const group = (title: string, units: number, perUnit: Record<string, number>): CrewGroup => ({
    title,
    units,
    windows: result.openingTypes
      .filter((o) => (perUnit[o.openingTypeId] ?? 0) > 0)
      .map((o) => {
        const n = perUnit[o.openingTypeId]!;
        return {
          mark: o.mark,
          size: { width: o.opening.width, height: o.opening.height },
          style: o.spec.style,
          perUnit: n,
          total: n * units,
          pieces: o.cutList.map((p) => ({ ...p, perUnit: p.quantity * n, total: p.quantity * n * units })),
        };
      }),
  });
  const groups = inputs.unitTypes.map((u) => group(u.name, u.count, inputs.counts.perUnit[u.id] ?? {}));
  groups.push(group("Common areas", 1, inputs.counts.commonAreas));
  return groups.filter((g) => g.windows.length > 0);
}
