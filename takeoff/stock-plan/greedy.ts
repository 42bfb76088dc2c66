import type { CountedColumn } from "./columns";
import type { Instance } from "./instance";

/**
 * First-fit decreasing on the board with the lowest price per unit length.
 * Only a fallback if the solver finds no integer plan within its limits;
 * finishPlan then moves each board to the cheapest length that holds it.
 */
export function firstFitDecreasing(inst: Instance, demand: ArrayLike<number>): CountedColumn[] {
  const n = inst.items.length;
  const boards: { stock: number; room: number; a: Int32Array }[] = [];
  inst.items.forEach((item, i) => {
    for (let left = demand[i] ?? 0; left > 0; left--) {
      let board = boards.find((b) => b.room >= item.w);
      if (!board) {
        let stock = -1;
        inst.stocks.forEach((s, k) => {
          const cur = inst.stocks[stock];
          if (s.cap >= item.w && (!cur || s.priceNum / s.cap < cur.priceNum / cur.cap)) stock = k;
        });
        if (stock < 0) throw new Error(`stock plan: no board holds a ${item.lengthNum} in piece on the planning grid`);
        board = { stock, room: inst.stocks[stock]?.cap ?? 0, a: new Int32Array(n) };
        boards.push(board);
      }
      board.room -= item.w;
      board.a[i] = (board.a[i] ?? 0) + 1;
    }
  });
  return boards.map((b) => ({ stock: b.stock, a: b.a, count: 1 }));
}
