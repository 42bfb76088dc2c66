import type { ProjectScope } from "@/db/queries/project-scope";
import { findTakeoffHeader } from "@/db/queries/takeoffs";
import { orNotFound } from "@/lib/errors";
import { cachedSnapshotText, keepSnapshotText, snapshotMembers } from "./snapshot-text";
import { getTakeoff, MISSING_TAKEOFF } from "./takeoffs";

/**
 * `{"takeoff": …}` exactly as `JSON.stringify({ takeoff: await getTakeoff(s, id) })` would write it, but
 * with the snapshots' text reused (see snapshot-text.ts): the row is still read on every call — its
 * name, note and status can change, and a deleted or foreign takeoff must answer 404.
 */
export async function takeoffJson(s: ProjectScope, id: string): Promise<string> {
  const cached = cachedSnapshotText(s, id);
  if (cached === undefined) {
    const full = await getTakeoff(s, id);
    const members = snapshotMembers(full);
    keepSnapshotText(s, id, members);
    const { inputs: _i, prices: _p, result: _r, ...header } = full;
    return splice(header, members);
  }
  return splice(orNotFound(await findTakeoffHeader(s, id), MISSING_TAKEOFF), cached);
}

const splice = (header: object, members: string) => `{"takeoff":${JSON.stringify(header).slice(0, -1)},${members}}}`;
