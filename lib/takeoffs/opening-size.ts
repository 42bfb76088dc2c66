import type { Opening } from "@/takeoff";
import { angleText } from "./cut-details";
import { inchesText, tapeLength } from "./format";

/** An opening's size as the estimator entered it, in words for its kind (an opening with no kind is a window). */
export function openingSizeText(o: Opening): string {
  const setback = "setback" in o ? ` · setback ${inchesText(o.setback)}` : "";
  switch (o.kind) {
    case "mulled":
      return `${o.widths.length} units ${o.widths.map(tapeLength).join(" + ")} × ${tapeLength(o.height)}, mull gap ${inchesText(o.mullGap)}${setback}`;
    case "door":
      return `Door ${tapeLength(o.width)} × ${tapeLength(o.height)}, cased ${o.sides === 2 ? "both sides" : "one side"}`;
    case "round-top":
      return `Half-round head ${tapeLength(o.width)} wide, ${tapeLength(o.springHeight)} to the spring line${setback}`;
    case "segment-top":
      return `Segment head ${tapeLength(o.width)} wide, rise ${inchesText(o.rise)}, ${tapeLength(o.springHeight)} to the spring line${setback}`;
    case "bay":
      return `${o.widths.length > 3 ? "Bow" : "Bay"} of ${o.widths.length} units ${o.widths.map(tapeLength).join(" + ")} × ${tapeLength(o.height)}, corners turn ${angleText(o.turn)}${setback}`;
    default:
      return `${tapeLength(o.width)} × ${tapeLength(o.height)} jamb to jamb${setback}`;
  }
}
