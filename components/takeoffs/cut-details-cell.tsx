import { cutDetails } from "@/lib/takeoffs/cut-details";
import type { CutPiece } from "@/takeoff";

/** Radius and sweep, saw settings, edge bevel and scarf split of one piece, under its ends; nothing when it has none. */
export function CutDetails({ piece }: { piece: CutPiece }) {
  const details = cutDetails(piece);
  if (details.length === 0) return null;
  return (
    <ul className="mt-0.5 space-y-0.5 text-xs text-graphite-700">
      {details.map((d) => (
        <li key={d}>{d}</li>
      ))}
    </ul>
  );
}
