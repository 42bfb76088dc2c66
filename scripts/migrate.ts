// Applies the drizzle-kit migrations in drizzle/ to DATABASE_URL.
import { migrateDatabase } from "@/db/migrate";

await migrateDatabase(process.env.DATABASE_URL!);
console.log("migrations applied");
