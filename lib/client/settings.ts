import type { TrimSpec } from "@/takeoff";
import { request } from "./fetch";
import { orgPath } from "./org-scope";

/** The company's settings as the settings route answers; the page is handed them by the server, so nothing caches them. */
export type ClientSettings = { trimDefaults: TrimSpec; trimDefaultsOwn: boolean; kerf: number; wastePercent: number };

export const saveSettings = async (orgSlug: string, body: unknown) =>
  (await request<{ settings: ClientSettings }>(`${orgPath(orgSlug)}/settings`, { method: "PATCH", body })).settings;
