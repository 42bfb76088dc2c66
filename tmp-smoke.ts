import { planStock } from "./takeoff/stock-plan/plan-stock";
let t = performance.now();
const p = await planStock([{length:45,quantity:97},{length:36,quantity:610},{length:31,quantity:395},{length:14,quantity:211}], [{length:100, price:1}], {kerf:0});
console.log(performance.now()-t, p.boardCount, p.cost, p.lowerBound, p.boards.length);
t = performance.now();
const p2 = await planStock([{length:45,quantity:9},{length:36,quantity:6},{length:31,quantity:3},{length:14,quantity:2}], [{length:100, price:10},{length:80,price:8.5}], {kerf:0.125});
console.log(performance.now()-t, p2);
