import { expect, it } from "vitest";
import { computeTakeoff } from "@/takeoff";
import { crewCutList } from "./crew-cut-list";
import { testInputs, testPrices } from "@/takeoff/testing/job-fixtures";

it("groups by unit type then window type; per unit × units adds up to the job", async () => {
  const inputs = testInputs();
  const result = await computeTakeoff(inputs, testPrices());
  const groups = crewCutList(inputs, result);
  expect(groups.map((g) => [g.title, g.units, g.windows.map((w) => [w.mark, w.perUnit, w.total])])).toEqual([
    ["Type A", 10, [["W1", 2, 20], ["W4", 1, 10]]],
    ["Common areas", 1, [["W1", 3, 3]]],
  ]);
  // Every piece of the job is in exactly one group: totals per mark and part match the job's quantity × cut list.
  for (const ot of result.openingTypes) {
    for (const piece of ot.cutList) {
      const inGroups = groups.flatMap((g) => g.windows.filter((w) => w.mark === ot.mark).flatMap((w) => w.pieces.filter((p) => p.part === piece.part))).reduce((t, p) => t + p.total, 0);
      expect(inGroups).toBe(piece.quantity * ot.quantity);
    }
  }
});
