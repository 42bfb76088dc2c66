import { cutList } from "../cut-list";
import { formatLength } from "../length-format";
import type { CutPiece, Opening, TrimSpec } from "../types";

/** A window whose sizes and trim spec cannot be cut: which field, and a sentence that says what would fix it. */
export interface OpeningProblem {
  /** The API field: `width`, `height`, `setback` or `trimSpec.<name>`. */
  field: string;
  message: string;
}

const OPENING_FIELDS = new Set(["width", "height", "setback", "kind", "widths", "mullGap", "sides", "springHeight", "rise", "turn", "seat"]);

/**
 * Runs the cut list for one opening type and turns an engine refusal into words about this window.
 * The engine names the field first ("apronInset: …"); the apron case is worked out here in full,
 * because "leaves no apron" alone does not tell an estimator what inset would do.
 */
export function checkOpening(opening: Opening, spec: TrimSpec): { pieces: CutPiece[] } | { problem: OpeningProblem } {
  try {
    return { pieces: cutList(opening, spec) };
  } catch (error) {
    const text = error instanceof Error ? error.message : String(error);
    const [, name = "", detail = text] = /^(?:spec\.|opening\.)?(\w+)(?:\.\w+)*: (.*)$/s.exec(text) ?? [];
    const field = OPENING_FIELDS.has(name) ? name : name ? `trimSpec.${name}` : "trimSpec";
    if (name === "apronInset" && spec.apronInset !== undefined && "width" in opening) {
      // The apron spans the casing's outer edges less the inset at each end (cut-list.ts, stool-and-apron).
      const reveal = spec.reveal ?? 0.125;
      const across = opening.width + 2 * reveal + 2 * spec.casingWidth;
      return {
        problem: {
          field,
          message: `An apron inset of ${formatLength(spec.apronInset)} at each end leaves no apron: the casing is ${formatLength(across)} across this ${formatLength(opening.width)} window. Use an inset under ${formatLength(Math.floor((across / 2) * 16) / 16)}.`,
        },
      };
    }
    return { problem: { field, message: detail.charAt(0).toUpperCase() + detail.slice(1) + "." } };
  }
}
