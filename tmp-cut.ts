import { cutList } from "./takeoff/cut-list";
let seed = 5; const r = () => (seed = (seed * 16807) % 2147483647) / 2147483647;
const specs = [{ style: "stool-and-apron" as const, casingWidth: 2.5, casingThickness: 0.6875 }, { style: "picture-frame" as const, casingWidth: 3.25, casingThickness: 0.75, reveal: 0.1875 }];
const sizes = Array.from({ length: 30 }, () => ({ opening: { width: 18 + Math.round(r() * 54 * 8) / 8, height: 20 + Math.round(r() * 56 * 8) / 8, setback: 0.6875 }, spec: specs[Math.floor(r() * 2)]! }));
const t = performance.now();
let n = 0;
for (let i = 0; i < 10000; i++) { const s = sizes[Math.floor(r() * 30)]!; n += cutList(s.opening, s.spec).length; }
console.log("10k cutList ms", (performance.now() - t).toFixed(1), n);
