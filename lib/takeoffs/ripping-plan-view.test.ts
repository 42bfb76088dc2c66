/** The crew cut list's "Ripping and cutting plan" as rendered (server markup), from hand-made orders. */
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { RippingPlan } from "@/components/takeoffs/ripping-plan";
import type { BoardOrder } from "@/takeoff";
import { crosscutOrder, rippedOrder } from "./testing/board-orders";

const text = (orders: BoardOrder[]) =>
  renderToStaticMarkup(createElement(RippingPlan, { orders }))
    .replace(/<\/(td|th|li|p|h2|h3)>/g, "|")
    .replace(/<[^>]+>/g, "")
    .replace(/&quot;/g, '"')
    .replace(/&#x27;/g, "'")
    .replace(/&amp;/g, "&");

describe("ripping and cutting plan", () => {
  it("is left out when no order is ripped to layouts (single-width and older takeoffs stay as they were)", () => {
    const old = rippedOrder({ widths: undefined, width: 1.4375 });
    old.rip = { ...old.rip!, layouts: undefined };
    expect(renderToStaticMarkup(createElement(RippingPlan, { orders: [crosscutOrder(), old] }))).toBe("");
  });

  it("lists each layout, then each strip's cuts in cutting order, with the table-saw cautions", () => {
    const t = text([crosscutOrder(), rippedOrder()]);
    expect(t).toContain("Ripping and cutting plan|");
    expect(t).toMatch(/riving knife or splitter/);
    expect(t).toMatch(/push stick/);
    expect(t).toMatch(/never freehand/);
    expect(t).toMatch(/manufacturer's manual/);
    expect(t).toMatch(/Local building codes/);
    expect(t).toContain(`Extension 1x6 poplar · Jamb extension · strips of 1 1/2", 3/4"|`);
    // Rip first: the layouts in the order given, then crosscuts.
    const rip = t.indexOf(`12 × 16' boards, each ripped to 1 1/2" + 3/4" + 3/4" (2 1/8" left)|`);
    const rip2 = t.indexOf(`1 × 12' board, ripped to 1 1/2" + 1 1/2" + 3/4" (1 3/8" left)|`);
    const cuts = t.indexOf("2. Crosscut each strip");
    expect(rip).toBeGreaterThan(0);
    expect(rip2).toBeGreaterThan(rip);
    expect(cuts).toBeGreaterThan(rip2);
    const rows = t.slice(cuts).split("|");
    const after = rows.slice(rows.indexOf("Offcut each") + 1).join("|");
    expect(after).toBe(
      [
        `1 1/2" strips from 16' boards|10|2 × 5'-0 3/4" + 3'-0"|2'-10 1/8"`,
        `1 1/2" strips from 16' boards|2|5'-0 3/4"|10'-11 1/8"`,
        `1 1/2" strips from 12' boards|2|2 × 5'-0 3/4"|1'-10 1/4"`,
        `3/4" strips from 16' boards|20|5 × 3'-0"|11 3/8"`,
        `3/4" strips from 16' boards|4|spare, not cut|whole strip`,
        `3/4" strips from 12' boards|1|2 × 3'-0"|5'-11 3/4"|`,
      ].join("|"),
    );
    // The crosscut-only casing order has no ripping plan of its own.
    expect(t).not.toContain("Casing 2 1/2");
  });
});
