/** The results cut list and the crew cut list as rendered (server markup), from the engine's own cut lists. */
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { CrewCutListTable } from "@/components/takeoffs/crew-cut-list-table";
import { CutListTable } from "@/components/takeoffs/cut-list-table";
import { cutList, splitLongPieces, type CutPiece, type Opening, type OpeningTypeResult, type TrimSpec } from "@/takeoff";
import { angleText, cutDetails } from "./cut-details";

const SA: TrimSpec = { style: "stool-and-apron", casingWidth: 3.5, casingThickness: 0.75, reveal: 0.25 };
const text = (html: string) =>
  html
    .replace(/<\/(td|th|li|h3)>/g, "|")
    .replace(/<[^>]+>/g, "")
    .replace(/&quot;/g, '"')
    .replace(/&#x27;/g, "'")
    .replace(/&amp;/g, "&");

/** An opening type as the results page holds it; `opening` cast because saved results type it as a window's fields. */
const ot = (opening: Opening, pieces: CutPiece[] = cutList(opening, SA)): OpeningTypeResult =>
  ({ openingTypeId: "t1", mark: "X1", quantity: 3, spec: SA, opening, cutList: pieces, items: {} }) as unknown as OpeningTypeResult;
const results = (o: OpeningTypeResult) => text(renderToStaticMarkup(createElement(CutListTable, { ot: o, itemName: () => "Stock" })));
const crew = (o: OpeningTypeResult) =>
  text(
    renderToStaticMarkup(
      createElement(CrewCutListTable, {
        w: { mark: o.mark, size: { width: 0, height: 0 }, style: o.spec.style, perUnit: 1, total: 1, pieces: o.cutList.map((p) => ({ ...p, perUnit: p.quantity, total: p.quantity })) },
        units: 1,
        opening: o.opening as Opening,
      }),
    ),
  );

const halfRound: Opening = { kind: "round-top", width: 48, springHeight: 40, setback: 0.75 };
const bay: Opening = { kind: "bay", widths: [24, 48, 24], turn: 45, height: 54, setback: 0.75, mullGap: 3 };
const triple: Opening = { kind: "mulled", widths: [36, 36, 36], height: 60, setback: 0.5, mullGap: 2 };

describe("saw settings in words", () => {
  it("writes quarter degrees as a saw scale does, and other angles to a tenth", () => {
    expect([45, 22.5, 11.25, 0.75, 15, 7.13].map(angleText)).toEqual(["45°", "22 1/2°", "11 1/4°", "3/4°", "15°", "7.1°"]);
  });

  it("says nothing for a plain straight piece", () => {
    expect(cutDetails({ part: "casing-leg", material: "casing", quantity: 2, length: 50, ends: ["square", "miter"] })).toEqual([]);
  });
});

describe.each([
  ["results cut list", results],
  ["crew cut list", crew],
])("%s", (_, render) => {
  it("prints a half-round's arch radius and sweep (48 in, 1/4 in reveal → R 24 1/4 in, 180°)", () => {
    const t = render(ot(halfRound));
    expect(t).toContain('R 24 1/4", 180°');
    expect(t).toContain("length on the outer edge");
    expect(t).toContain('R 24", 180°'); // the bent extension strip: radius width/2
  });

  it("prints the bay's corner saw settings and the mullions' edge bevel (45° turn → 22 1/2°)", () => {
    const t = render(ot(bay));
    expect(t).toContain("saw miter 45° / bevel 22 1/2°"); // flanker head: wall-end miter, corner bevel
    expect(t).toContain("saw bevel 22 1/2°, both ends"); // centre head
    expect(t).toContain("saw square / miter 22 1/2°"); // flanker stool
    expect(t).toContain("edge bevel 22 1/2°");
  });

  it("prints each part of a head split by scarf joints, with the overlap", () => {
    // 3 × 36 + 2 × 2 + 2 × 1/4 + 2 × 3 1/2 = 119 1/2 in head: longer than a 96 in board, so split in two.
    const pieces = splitLongPieces(cutList(triple, SA), [96], { overlap: 6 });
    const t = render(ot(triple, pieces));
    expect(t).toContain('part 1 of 2, 6" scarf overlap');
    expect(t).toContain('part 2 of 2, 6" scarf overlap');
    expect(t).toContain("Scarf joint");
  });
});

it("the crew cut list names each opening's size in words for its kind", () => {
  expect(crew(ot({ kind: "door", width: 30, height: 81, sides: 2 }))).toContain(`X1 · Door 2'-6" × 6'-9", cased both sides · 1 per unit`);
  expect(crew(ot(triple))).toContain(`3 units 3'-0" + 3'-0" + 3'-0" × 5'-0", mull gap 2"`);
});
