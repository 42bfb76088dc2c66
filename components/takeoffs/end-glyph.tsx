import type { End } from "@/takeoff";
import { END_LABELS } from "@/lib/takeoffs/labels";

/**
 * A board's end as a small picture beside its name: square, mitered (long point on the face edge) or
 * mitered with its return turning back toward the wall. Drawn for the right-hand end; `side="left"` mirrors.
 */
const SHAPES: Record<End, string[]> = {
  square: ["M1 3.5H19V9.5H1Z"],
  miter: ["M1 3.5H19L13 9.5H1Z"],
  return: ["M1 2.5H19L15 6.5H1Z", "M19 2.5V11.5H15V6.5Z"],
  bevel: ["M1 3.5H17L19 9.5H1Z"],
  scarf: ["M1 3.5H19L11 9.5H1Z"],
};

export function EndGlyph({ end, side = "right" }: { end: End; side?: "left" | "right" }) {
  return (
    <svg viewBox="0 0 20 13" className="inline-block h-3 w-5 shrink-0 align-[-1px]" aria-hidden>
      <g transform={side === "left" ? "translate(20 0) scale(-1 1)" : undefined}>
        {SHAPES[end].map((d) => (
          <path key={d} d={d} className="fill-maple-200 stroke-graphite-700" strokeWidth="1" strokeLinejoin="round" />
        ))}
      </g>
    </svg>
  );
}

/** Both ends in words, each with its picture; one entry when they match. */
export function EndsCell({ ends }: { ends: readonly [End, End] }) {
  if (ends[0] === ends[1]) {
    return (
      <span className="inline-flex items-start gap-1">
        <span className="flex shrink-0 gap-0.5 pt-0.5">
          <EndGlyph end={ends[0]} side="left" />
          <EndGlyph end={ends[1]} />
        </span>
        <span>{END_LABELS[ends[0]]}, both</span>
      </span>
    );
  }
  return (
    <span className="inline-flex flex-wrap items-center gap-x-1">
      <span className="inline-flex items-center gap-1 whitespace-nowrap">
        <EndGlyph end={ends[0]} side="left" />
        {END_LABELS[ends[0]]}
      </span>
      <span aria-hidden className="text-graphite-500">/</span>
      <span className="sr-only">and</span>
      <span className="inline-flex items-center gap-1 whitespace-nowrap">
        <EndGlyph end={ends[1]} />
        {END_LABELS[ends[1]]}
      </span>
    </span>
  );
}
