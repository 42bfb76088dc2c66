import { pgTable, text, uuid } from "drizzle-orm/pg-core";
import { createdAt } from "./common";

/**
 * What `npm run demo` has seeded, by a key fixed in the seed's code ("price-book:birchmoor"), so re-running it
 * finds its rows again even after people renamed them — and never seeds a second copy.
 */
export const seedMarks = pgTable("seed_marks", {
  key: text("key").primaryKey(),
  rowId: uuid("row_id").notNull(),
  createdAt: createdAt(),
});
