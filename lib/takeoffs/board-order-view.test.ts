/**
 * The board-order table as rendered (server markup), from hand-made orders: the proof line, the ripping
 * layouts, and that takeoffs saved before either render as they always did.
 */
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { BoardOrderTable } from "@/components/takeoffs/board-order-table";
import type { BoardOrder } from "@/takeoff";
import { testPrices } from "@/takeoff/testing/job-fixtures";
import { crosscutOrder, rippedOrder } from "./testing/board-orders";

const items = testPrices().items;
const html = (orders: BoardOrder[], extra: { settingsHref?: string; planSeconds?: number } = {}) =>
  renderToStaticMarkup(createElement(BoardOrderTable, { orders, items, ...extra }));
/** Visible text, one space between elements, entities decoded. */
const text = (markup: string) =>
  markup
    .replace(/<[^>]+>/g, " ")
    .replace(/&quot;/g, '"')
    .replace(/&#x27;/g, "'")
    .replace(/&amp;/g, "&")
    .replace(/\s+/g, " ")
    .trim();

/** A single-width ripped order as saved before layouts and proofs: width, stripsPerBoard, no layouts, no proof. */
const oldRipped = (): BoardOrder => {
  const o = rippedOrder({ widths: undefined, width: 1.4375, stockWidth: 3.5 });
  const { proof: _p, budgetSpent: _b, ...plan } = o.plan;
  return { ...o, plan: { ...plan, boards: plan.boards.map(({ width: _w, ...b }) => b) }, rip: { ...o.rip!, stripsPerBoard: 2, layouts: undefined } };
};

describe("board order table", () => {
  it("shows takeoffs saved before proofs and layouts as before: no proof words, no notes row, no notice", () => {
    const markup = html([crosscutOrder(), oldRipped()]);
    const t = text(markup);
    expect(t).toContain(`Jamb extension ripped to 1 7/16" from 3 1/2" board, 2 strips per board · 60 pieces, 200.0 ft`);
    expect(t).not.toMatch(/proven|Best found|Optimal|ripped to 1 1\/2"|Crosscuts/);
    expect(markup).not.toContain('role="note"');
    expect(markup).not.toContain('colSpan="7"');
  });

  it("marks a proven order and says nothing above the table", () => {
    const o = crosscutOrder({ plan: { ...crosscutOrder().plan, proof: "optimal", cost: 251.3 } });
    const markup = html([o]);
    expect(text(markup)).toContain("✓ Optimal — proven");
    expect(markup).not.toContain('role="note"');
  });

  it("a best-found order gets its bound beside it and a line above pointing to the time limit in Settings", () => {
    const best = crosscutOrder({ plan: { ...crosscutOrder().plan, proof: "best-found", budgetSpent: true } });
    const markup = html([best, crosscutOrder({ itemId: "casing-35", plan: { ...crosscutOrder().plan, proof: "optimal" } })], { settingsHref: "/birchmoor/settings", planSeconds: 2 });
    const t = text(markup);
    expect(t).toContain(
      "1 of 2 board orders are the best found, not proven cheapest: it costs at most $12.70 more than the proven bound given beside it. The search stopped at the board-order time limit (2 s for this run)",
    );
    expect(markup).toMatch(/<a [^>]*href="\/birchmoor\/settings"[^>]*>Settings → Board-order time limit<\/a>/);
    expect(t).toContain("Best found within the time limit. Proven: no cutting plan can use fewer than 16 boards, and none can cost less than $251.30");
    // The notice comes before the table.
    expect(markup.indexOf('role="note"')).toBeLessThan(markup.indexOf("<table"));
  });

  it("best found for another reason than the clock does not point to the time limit", () => {
    const t = text(html([crosscutOrder({ plan: { ...crosscutOrder().plan, proof: "best-found", budgetSpent: false } })], { settingsHref: "/x/settings" }));
    expect(t).toContain("The board order is the best found, not proven cheapest");
    expect(t).not.toContain("time limit");
  });

  it("a ripped order lists which strips come from which boards and the crosscuts along each strip width", () => {
    const t = text(html([rippedOrder()]));
    expect(t).toContain(`Jamb extension ripped to 1 1/2", 3/4" from 5 1/2" board · 60 pieces`);
    expect(t).not.toContain("strips per board");
    expect(t).toContain(`12 × 16' boards, each ripped to 1 1/2" + 3/4" + 3/4" (2 1/8" left)`);
    expect(t).toContain(`1 × 12' board, ripped to 1 1/2" + 1 1/2" + 3/4" (1 3/8" left)`);
    expect(t).toContain(`3/4" strips from 16' boards (24 strips) 20 strips: 5 × 3'-0" (11 3/8" offcut) 4 spare strips, not cut (offcut)`);
    // Boards, not strips, in the plan column: 12 sixteen-footers and 1 twelve.
    expect(t).toMatch(/16' 12 14 \$26\.00 \$364\.00 12' 1 2 \$20\.00 \$40\.00/);
  });
});
