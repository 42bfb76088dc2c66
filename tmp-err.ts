import { cutList, planStock } from "./takeoff/index";
const spec = { style: "stool-and-apron" as const, casingWidth: 2.5, casingThickness: 0.75 };
for (const f of [
  () => cutList({ width: NaN, height: 40, setback: 1 }, spec),
  () => cutList({ width: 30, height: 40, setback: -1 }, spec),
  () => cutList({ width: 30, height: 40, setback: 1 }, { ...spec, reveal: 3 }),
  () => cutList({ width: 30, height: 40, setback: 1 }, { ...spec, style: "x" as never }),
  () => cutList({ width: 30, height: 40, setback: 1 }, { ...spec, casingThickness: -1 }),
  () => planStock([{ length: 200, quantity: 1 }], [{ length: 96, price: 1 }, { length: 192, price: 2 }], { kerf: 0.125 }),
  () => planStock([{ length: 20, quantity: 1.5 }], [{ length: 96, price: 1 }], { kerf: 0.125 }),
]) { try { f(); console.log("no throw"); } catch (e) { console.log((e as Error).message); } }
