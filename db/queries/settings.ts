import { eq } from "drizzle-orm";
import { db } from "../client";
import { organisations } from "../schema";

/** The organisation's own defaults as stored: null where it has not set them. */
export async function findSettings({ orgId }: { orgId: string }) {
  const [row] = await db
    .select({ trimDefaults: organisations.trimDefaults, takeoff: organisations.takeoffSettings })
    .from(organisations)
    .where(eq(organisations.id, orgId));
  return { trimDefaults: row?.trimDefaults ?? null, takeoff: row?.takeoff ?? null };
}

type Stored = Awaited<ReturnType<typeof findSettings>>;

export async function writeSettings({ orgId }: { orgId: string }, values: { trimDefaults?: Stored["trimDefaults"]; takeoff: NonNullable<Stored["takeoff"]> }) {
  await db
    .update(organisations)
    .set({ ...(values.trimDefaults !== undefined ? { trimDefaults: values.trimDefaults } : {}), takeoffSettings: values.takeoff })
    .where(eq(organisations.id, orgId));
}
