import { LockMark } from "@/components/ui/lock-mark";

/** A plain GET form: the choice lives in the URL, so a comparison can be bookmarked and shared with the team. */
export function TakeoffPicker({
  takeoffs,
  selected,
}: {
  takeoffs: { id: string; name: string; status: string; createdAt: string; projectName: string }[];
  selected: string[];
}) {
  if (takeoffs.length === 0) return <p className="text-sm text-graphite-600">No takeoffs yet. Run one from a project&apos;s Takeoffs tab.</p>;
  const byProject = new Map<string, typeof takeoffs>();
  for (const t of takeoffs) byProject.set(t.projectName, [...(byProject.get(t.projectName) ?? []), t]);
  return (
    <form method="get" className="space-y-4">
      {[...byProject.entries()].map(([project, list]) => (
        <fieldset key={project}>
          <legend className="text-sm font-semibold text-graphite-900">{project}</legend>
          <ul className="mt-1 space-y-1">
            {list.map((t) => (
              <li key={t.id}>
                <label className="flex items-center gap-2 text-sm">
                  <input type="checkbox" name="ids" value={t.id} defaultChecked={selected.includes(t.id)} />
                  <span className="font-medium">{t.name}</span>
                  {t.status === "submitted" && <span className="text-xs text-brass-700">
                      <LockMark /> submitted
                    </span>}
                  <span className="text-xs text-graphite-600">{new Date(t.createdAt).toLocaleDateString("en-US")}</span>
                </label>
              </li>
            ))}
          </ul>
        </fieldset>
      ))}
      <button type="submit" className="rounded-md bg-spruce-700 px-3.5 py-2 text-sm font-semibold text-maple-50 hover:bg-spruce-800">
        Compare
      </button>
    </form>
  );
}
