import type { ResolvedOpening, ResolvedSpec } from "../trim-defaults";
import { MITERS, sillPieces, unitExtensions, type ExactPiece } from "./piece";

/**
 * Stool-and-apron: H runs from the top of the stool to the underside of the
 * head jamb. Legs stand on the stool and meet the head at a miter (long point
 * given); the head spans both legs' outer edges; the stool adds a horn past
 * each leg; the apron sits under the stool, set in from the casing line.
 */
function stoolAndApron(o: ResolvedOpening, s: ResolvedSpec): ExactPiece[] {
  const outer = o.width.add(s.reveal.mul(2)).add(s.casingWidth.mul(2));
  return [
    { part: "casing-leg", material: "casing", quantity: 2, length: o.height.add(s.reveal).add(s.casingWidth), ends: ["square", "miter"] },
    { part: "casing-head", material: "casing", quantity: 1, length: outer, ends: MITERS },
    ...sillPieces(outer, o.setback, s),
    ...unitExtensions(o.width, o.height, o.setback, s),
  ];
}

/** Picture-frame: four casing pieces mitered at every corner; H is jamb to jamb. */
function pictureFrame(o: ResolvedOpening, s: ResolvedSpec): ExactPiece[] {
  const across = o.width.add(s.reveal.mul(2)).add(s.casingWidth.mul(2));
  const leg = o.height.add(s.reveal.mul(2)).add(s.casingWidth.mul(2));
  return [
    { part: "casing-leg", material: "casing", quantity: 2, length: leg, ends: MITERS },
    { part: "casing-head", material: "casing", quantity: 1, length: across, ends: MITERS },
    { part: "casing-bottom", material: "casing", quantity: 1, length: across, ends: MITERS },
    ...unitExtensions(o.width, o.height, o.setback, s),
  ];
}

/** The rectangular window, unchanged from before opening kinds. */
export function windowPieces(o: ResolvedOpening, s: ResolvedSpec): ExactPiece[] {
  return s.style === "stool-and-apron" ? stoolAndApron(o, s) : pictureFrame(o, s);
}
