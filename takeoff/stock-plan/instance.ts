import { ceilDiv, exact, floorDiv, Fraction, numer } from "../exact";
import { formatLength } from "../length-format";
import { demandSchema, planOptionsSchema, stockItemSchema } from "../schemas";
import type { Demand, PlanOptions, StockItem } from "../types";
import { parseOrThrow } from "../validate";

/**
 * Largest board length, in grid units, the knapsack tables may span. 1/16-in
 * work on 20 ft boards needs 3,840; finer or odd decimals fall back to a
 * coarser grid (see buildInstance).
 */
const GRID_LIMIT = 60_000;

export interface PlanItem {
  length: Fraction;
  lengthNum: number;
  demand: number;
  /** length + kerf in grid units, rounded up: patterns built with it always fit. */
  w: number;
  /** length + kerf in grid units, rounded down: used only for lower bounds. */
  wLb: number;
}

export interface PlanStock {
  length: Fraction;
  lengthNum: number;
  price: Fraction;
  priceNum: number;
  /** Board length in grid units, rounded down (pattern side). */
  cap: number;
  /** Board length in grid units, rounded up (lower-bound side). */
  capLb: number;
}

export interface Instance {
  items: PlanItem[];
  stocks: PlanStock[];
  kerf: Fraction;
  kerfNum: number;
}

function lcm(a: bigint, b: bigint): bigint {
  let x = a;
  let y = b;
  while (y !== 0n) [x, y] = [y, x % y];
  return (a / x) * b;
}

/**
 * Validates and normalises a planning request: merges equal lengths, drops
 * zero quantities, and lays every length on an integer grid. When all lengths,
 * the kerf and board lengths share a denominator D small enough, the grid is
 * exact (1/D in). Otherwise pattern weights round up and board lengths down,
 * so every pattern still fits, while lower-bound weights round the other way,
 * so the bound stays a true relaxation.
 */
export function buildInstance(demand: readonly Demand[], stock: readonly StockItem[], opts: PlanOptions): Instance {
  if (!Array.isArray(demand)) throw new Error("demand must be a list");
  if (!Array.isArray(stock) || stock.length === 0) throw new Error("stock: at least one stock length is needed");
  const kerf = exact(parseOrThrow(planOptionsSchema, opts, "opts").kerf);
  const stocks = stock.map((s, i) => {
    const v = parseOrThrow(stockItemSchema, s, `stock[${i}]`);
    const [length, price] = [exact(v.length), exact(v.price)];
    return { length, lengthNum: v.length, price, priceNum: v.price, cap: 0, capLb: 0 };
  });
  const merged = new Map<string, { length: Fraction; lengthNum: number; demand: number }>();
  demand.forEach((d, i) => {
    const v = parseOrThrow(demandSchema, d, `demand[${i}]`);
    if (v.quantity === 0) return;
    const length = exact(v.length);
    const key = length.toFraction();
    const m = merged.get(key);
    if (m) m.demand += v.quantity;
    else merged.set(key, { length, lengthNum: v.length, demand: v.quantity });
  });
  const longest = stocks.reduce((a, s) => (s.length.gt(a) ? s.length : a), new Fraction(0));
  for (const m of merged.values()) {
    if (m.length.add(kerf).gt(longest)) {
      throw new Error(
        `piece ${formatLength(m.lengthNum)} (${m.lengthNum} in) is longer than every stock length: ` +
          `the longest, ${longest.valueOf()} in, holds at most ${longest.sub(kerf).valueOf()} in after a ${kerf.valueOf()} in kerf`,
      );
    }
  }
  let denom = kerf.d;
  for (const m of merged.values()) denom = lcm(denom, m.length.d);
  for (const s of stocks) denom = lcm(denom, s.length.d);
  const exactGrid = longest.mul(denom).lte(GRID_LIMIT);
  const unit = exactGrid ? denom : BigInt(Math.max(1, Math.floor(GRID_LIMIT / longest.valueOf())));
  const up = (f: Fraction) => Number(ceilDiv(numer(f) * unit, f.d));
  const down = (f: Fraction) => Number(floorDiv(numer(f) * unit, f.d));
  for (const s of stocks) {
    s.cap = down(s.length);
    s.capLb = up(s.length);
  }
  const items = [...merged.values()]
    .sort((a, b) => b.length.compare(a.length))
    .map((m) => ({ ...m, w: up(m.length.add(kerf)), wLb: down(m.length.add(kerf)) }));
  return { items, stocks, kerf, kerfNum: kerf.valueOf() };
}
