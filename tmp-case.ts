import { planStock } from "./takeoff/stock-plan/plan-stock";
import { referenceOptimum, allPatterns } from "./takeoff/testing/reference-cutting-stock";
const inst = {
  demand: [{ length: 30, quantity: 5 }, { length: 47.0625, quantity: 5 }, { length: 13.5, quantity: 6 }, { length: 70, quantity: 2 }],
  stock: [{ length: 84, price: 9.1 }, { length: 96, price: 10.2 }, { length: 192, price: 19.5 }],
  kerf: 0.125,
};
await referenceOptimum({ demand: [{ length: 1, quantity: 1 }], stock: [{ length: 2, price: 1 }], kerf: 0 });
let t = performance.now();
const p = await planStock(inst.demand, inst.stock, { kerf: inst.kerf });
console.log("plan", (performance.now() - t).toFixed(0), p.cost, p.lowerBound);
t = performance.now();
console.log("patterns", allPatterns(inst).length);
console.log("ref", await referenceOptimum(inst), (performance.now() - t).toFixed(0));
for (let k = 0; k < 2; k++) {
t = performance.now();
await planStock(inst.demand, inst.stock, { kerf: inst.kerf });
console.log("plan again", (performance.now() - t).toFixed(0));
t = performance.now();
await referenceOptimum(inst);
console.log("ref again", (performance.now() - t).toFixed(0));
}
