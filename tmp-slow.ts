import fc from "fast-check";
import { planStock } from "./takeoff/stock-plan/plan-stock";
const sixteenths = (lo: number, hi: number) => fc.integer({ min: lo * 16, max: hi * 16 }).map((n) => n / 16);
const medium = fc.record({
  demand: fc.array(fc.record({ length: sixteenths(1, 90), quantity: fc.integer({ min: 0, max: 300 }) }), { minLength: 1, maxLength: 25 }),
  stock: fc.array(fc.record({ length: fc.integer({ min: 91, max: 192 }), price: fc.integer({ min: 0, max: 4000 }).map((c) => c / 100) }), { minLength: 1, maxLength: 4 }),
  kerf: fc.constantFrom(0, 0.125, 0.1),
});
const samples = fc.sample(medium, { numRuns: 60, seed: 42 });
for (const [idx, inst] of samples.entries()) {
  const t = performance.now();
  await planStock(inst.demand, inst.stock, { kerf: inst.kerf });
  const ms = performance.now() - t;
  if (ms > 50) console.log(idx, ms.toFixed(0), inst.demand.length, inst.demand.reduce((a, d) => a + d.quantity, 0), JSON.stringify(inst.stock), inst.kerf);
}
