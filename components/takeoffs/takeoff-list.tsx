import Link from "next/link";
import type { ProjectScope } from "@/lib/client/project-scope";
import { count, usd } from "@/lib/takeoffs/format";
import type { TakeoffListItem } from "@/lib/takeoffs/view";
import { LocalTime } from "./local-time";
import { TakeoffRowActions } from "./takeoff-row-actions";
import { TakeoffStatus } from "./takeoff-status";

/** The project's saved takeoffs, newest first: one line each with the figures an estimator compares. */
export function TakeoffList({
  takeoffs,
  pageBase,
  edit,
}: {
  takeoffs: TakeoffListItem[];
  pageBase: string;
  /** Given to roles that may rename and delete drafts: the project the takeoffs belong to. */
  edit?: ProjectScope;
}) {
  return (
    <div className="relative overflow-x-auto rounded-lg border border-maple-200 bg-white">
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">Saved takeoffs of this project, newest first</caption>
        <thead className="bg-maple-100 text-left text-graphite-700">
          <tr>
            <th scope="col" className="px-2 py-2 font-semibold">Takeoff</th>
            <th scope="col" className="px-2 py-2 font-semibold">Run by</th>
            <th scope="col" className="px-2 py-2 font-semibold">Price book</th>
            <th scope="col" className="px-2 py-2 text-right font-semibold">Openings</th>
            <th scope="col" className="px-2 py-2 text-right font-semibold">Bid total</th>
            <th scope="col" className="px-2 py-2 font-semibold">Status</th>
            {edit && (
              <th scope="col" className="px-2 py-2 font-semibold">
                <span className="sr-only">Actions</span>
              </th>
            )}
          </tr>
        </thead>
        <tbody>
          {takeoffs.map((t) => (
            <tr key={t.id} className={`border-t border-maple-100 align-top ${t.status === "submitted" ? "bg-spruce-50/60" : "hover:bg-maple-50"}`}>
              <td className="px-2 py-1.5">
                <Link href={`${pageBase}/${t.id}`} className="font-semibold text-spruce-700 underline underline-offset-2">
                  {t.name}
                </Link>
                {t.note && <p className="mt-0.5 max-w-md text-xs text-graphite-600">{t.note}</p>}
              </td>
              <td className="whitespace-nowrap px-2 py-1.5 text-graphite-700">
                {t.createdByName ?? "Former member"}
                <br />
                <span className="text-xs text-graphite-600">
                  <LocalTime iso={t.createdAt} />
                </span>
              </td>
              <td className="px-2 py-1.5">{t.priceBookName}</td>
              <td className="num px-2 py-1.5">{count(t.openingsTotal)}</td>
              <td className="num px-2 py-1.5 font-semibold">{usd(t.bidTotal)}</td>
              <td className="px-2 py-1.5">
                <TakeoffStatus status={t.status} />
              </td>
              {edit && (
                <td className="px-2 py-1.5">
                  <TakeoffRowActions takeoff={t} scope={edit} />
                </td>
              )}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
