import { bigint, index, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { createdAt } from "./common";
import { organisations, users } from "./accounts";
import { projects } from "./projects";

/**
 * One row per file the app presigned for upload. The upload service's callback is honoured only for a key
 * recorded here and not yet claimed, and the organisation, project and uploader come from this row — never
 * from the callback's body, which anyone holding the service's key could write.
 */
export const pendingUploads = pgTable(
  "pending_uploads",
  {
    // Also the file's customId at the upload service, which is how the presign answer ties a key to this row.
    id: uuid("id").primaryKey().defaultRandom(),
    orgId: uuid("org_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id, { onDelete: "cascade" }),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    // Known once the SDK has generated it, in the same request that presigned the upload.
    fileKey: text("file_key"),
    fileName: text("file_name").notNull(),
    fileSize: bigint("file_size", { mode: "number" }).notNull(),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    claimedAt: timestamp("claimed_at", { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("pending_uploads_file_key_key").on(t.fileKey), index("pending_uploads_expires_idx").on(t.expiresAt)],
);
