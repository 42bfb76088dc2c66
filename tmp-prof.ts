import { planStock } from "./takeoff/stock-plan/plan-stock";
const mk = (perFoot: Record<number, number>) => Object.entries(perFoot).map(([f, p]) => ({ length: Number(f) * 12, price: Math.round(Number(f) * p * 100) / 100 }));
const stock = mk({ 7: 1.49, 8: 1.39, 10: 1.36, 12: 1.41, 14: 1.52, 16: 1.58 });
let seed = 7; const r = () => (seed = (seed * 16807) % 2147483647) / 2147483647;
const demand = Array.from({ length: 55 }, () => ({ length: Math.round((20 + r() * 70) * 16) / 16, quantity: 200 + Math.floor(r() * 1000) }));
for (let k = 0; k < 3; k++) {
const t = performance.now();
const p = await planStock(demand, stock, { kerf: 0.125 });
console.log("plan ms", (performance.now() - t).toFixed(1), p.cost, p.lowerBound, p.boardCount, ((p.cost - p.lowerBound.cost) / p.lowerBound.cost * 100).toFixed(4) + "%");
}
let t = performance.now();
const p = await planStock([{length:45,quantity:97},{length:36,quantity:610},{length:31,quantity:395},{length:14,quantity:211}], [{length:100, price:1}], {kerf:0});
console.log(performance.now()-t, p.boardCount, p.cost, p.lowerBound, p.boards.length);
