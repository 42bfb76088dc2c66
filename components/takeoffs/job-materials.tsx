import { count, feet, ratioPercent, usd } from "@/lib/takeoffs/format";
import { MATERIAL_LABELS } from "@/lib/takeoffs/labels";
import type { TakeoffResult } from "@/takeoff";

const TH = "px-2 py-1.5 text-right font-semibold";
const TD = "num whitespace-nowrap px-2 py-1";

/** Per material over the whole job: what is cut, what is bought, what is lost, and how close the plan is to the best possible. */
export function JobMaterials({ result }: { result: TakeoffResult }) {
  const rows = result.materials;
  const cost = rows.reduce((t, m) => t + m.cost, 0);
  const bound = rows.reduce((t, m) => t + m.lowerBound, 0);
  const over = Math.max(0, cost - bound);
  return (
    <div className="space-y-2">
      <div className="relative overflow-x-auto rounded-lg border border-maple-200 bg-white">
        <table className="w-full border-collapse text-sm">
          <caption className="sr-only">Materials for the whole job</caption>
          <thead className="bg-maple-100 text-graphite-700">
            <tr>
              <th scope="col" className="px-2 py-1.5 text-left font-semibold">Material</th>
              <th scope="col" className={TH}>Pieces</th>
              <th scope="col" className={TH}>Linear ft cut</th>
              <th scope="col" className={TH}>Boards planned</th>
              <th scope="col" className={TH}>Ft bought</th>
              <th scope="col" className={TH}>Offcut &amp; kerf ft</th>
              <th scope="col" className={TH}>Yield</th>
              <th scope="col" className={TH} title="Most this order could cost more than the cheapest possible cutting plan">At most over cheapest</th>
              <th scope="col" className={TH}>Allowance boards</th>
              <th scope="col" className={TH}>Cost</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((m) => {
              const job = result.job.find((j) => j.material === m.material);
              return (
                <tr key={m.material} className="border-t border-maple-100">
                  <th scope="row" className="px-2 py-1 text-left font-medium">
                    {MATERIAL_LABELS[m.material]}
                  </th>
                  <td className={TD}>{job ? count(job.pieces) : "—"}</td>
                  <td className={`${TD} font-semibold`}>{feet(m.linearFeet)}</td>
                  <td className={TD}>{count(m.boardCount)}</td>
                  <td className={TD}>{feet(m.purchasedFeet)}</td>
                  <td className={TD}>{feet(m.offcutFeet)}</td>
                  <td className={TD}>{ratioPercent(m.yield)}</td>
                  <td className={TD}>{m.cost - m.lowerBound > 0.005 ? usd(m.cost - m.lowerBound) : "cheapest"}</td>
                  <td className={TD}>{count(m.allowanceBoards)}</td>
                  <td className={`${TD} font-semibold`}>{usd(m.cost + m.allowanceCost)}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <p className="text-xs text-graphite-600">
        Yield is length cut ÷ length bought in the cutting plan. {over > 0.005 ? <>Before the waste allowance, these boards cost at most {usd(over)} more than the cheapest possible way to cut these pieces: no arrangement of cuts buys them for less than {usd(bound)}.</> : "No arrangement of cuts buys these pieces for less."}{" "}
        Cost includes the waste-allowance boards.
      </p>
    </div>
  );
}
