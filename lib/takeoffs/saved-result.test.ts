import { expect, it } from "vitest";
import { computeTakeoff, type TakeoffResult } from "@/takeoff";
import { testInputs, testPrices } from "@/takeoff/testing/job-fixtures";
import { column } from "./compare";
import { costBreakdown } from "./cost-breakdown";
import { crewCutList } from "./crew-cut-list";
import { orderCsv } from "./order-csv";

// A row saved before the materials summary carried `pieces` and `boards` is the same JSON less those
// two fields; everything that reads a saved takeoff must come out the same from it.
it("a takeoff saved before pieces and boards per stock length were recorded reads as it did", async () => {
  const inputs = testInputs();
  const fresh = await computeTakeoff(inputs, testPrices());
  const saved: TakeoffResult = JSON.parse(JSON.stringify(fresh));
  for (const m of saved.materials) {
    delete m.pieces;
    delete m.boards;
  }
  expect(fresh.materials.every((m) => m.pieces! > 0 && m.boards!.length > 0)).toBe(true);
  expect(costBreakdown(saved)).toEqual(costBreakdown(fresh));
  expect(orderCsv(saved)).toBe(orderCsv(fresh));
  expect(crewCutList(inputs, saved)).toEqual(crewCutList(inputs, fresh));
  const compared = (result: TakeoffResult) => column({ id: "t", name: "t", projectName: "p", status: "draft", createdAt: new Date(0), inputs, prices: testPrices(), result });
  expect(compared(saved)).toEqual(compared(fresh));
});
