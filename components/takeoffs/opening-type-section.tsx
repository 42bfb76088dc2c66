import { elevation } from "@/lib/takeoffs/elevation";
import { count, inchesText } from "@/lib/takeoffs/format";
import { openingSizeText } from "@/lib/takeoffs/opening-size";
import { STYLE_NAMES } from "@/lib/takeoffs/labels";
import type { Opening, OpeningTypeResult, PriceItemSnapshot } from "@/takeoff";
import { CutListTable } from "./cut-list-table";
import { ElevationDrawing } from "./elevation-drawing";

export const CUT_CAUTION =
  "Before cutting: eye and hearing protection on, blade guards in place, hands clear of the blade path, and read each tool's manual. " +
  "Check every length against the opening on site; local building codes and licensed practice govern.";

/** One line of the openings list as built: its size and spec, the cut list and the drawing side by side. */
export function OpeningTypeSection({ ot, items }: { ot: OpeningTypeResult; items: PriceItemSnapshot[] }) {
  const itemName = (id: string | undefined) => items.find((i) => i.id === id)?.name ?? "—";
  const drawing = elevation(ot, items);
  // A door's casing takes no style: the spec's stool or picture frame does not apply to it.
  // (Typed loosely: saved results before opening kinds hold a window's fields only.)
  const opening: Opening = ot.kindOpening ?? ot.opening;
  const door = opening.kind === "door";
  return (
    <section className="break-inside-avoid rounded-lg border border-maple-200 bg-white p-4 shadow-sm print:shadow-none" aria-labelledby={`ot-${ot.openingTypeId}`}>
      <header className="mb-3 flex flex-wrap items-baseline gap-x-4 gap-y-1">
        <h3 id={`ot-${ot.openingTypeId}`} className="text-lg font-bold text-graphite-900">
          {ot.mark}
        </h3>
        <p className="text-sm text-graphite-700">
          {openingSizeText(opening)}
          {door ? "" : ` · ${STYLE_NAMES[ot.spec.style]}`} · casing {inchesText(ot.spec.casingWidth)} × {inchesText(ot.spec.casingThickness)}
        </p>
        <p className="ml-auto text-sm">
          <span className="num font-semibold">{count(ot.quantity)}</span> in the job
        </p>
      </header>
      {ot.quantity === 0 && <p className="mb-2 text-xs text-graphite-600">Not tagged on any sheet: listed for reference, not ordered or priced.</p>}
      <div className="grid items-start gap-4 xl:grid-cols-[minmax(0,1fr)_30rem] print:grid-cols-1">
        <CutListTable ot={ot} itemName={itemName} />
        <figure className="max-w-xl rounded-md print:max-w-[3.4in] border border-maple-200 bg-maple-50 p-2">
          <ElevationDrawing e={drawing} title={`Elevation of ${ot.mark} from the room, drawn to scale from the cut list.`} />
          <figcaption className="mt-1 text-xs text-graphite-600">
            Seen from the room. {door ? "" : "Dashed: jamb extensions behind the casing. "}
            {drawing.notes.join(" ")}
          </figcaption>
        </figure>
      </div>
      <p className="mt-3 border-l-4 border-brass-400 pl-2 text-xs text-graphite-700">
        <strong className="font-semibold">Safety. </strong>
        {CUT_CAUTION}
      </p>
    </section>
  );
}
