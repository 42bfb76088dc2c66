ALTER TABLE "plan_sets" ADD COLUMN "content_hash" text;--> statement-breakpoint
ALTER TABLE "sheets" ADD COLUMN "count_role" text DEFAULT 'counted' NOT NULL;--> statement-breakpoint
CREATE INDEX "plan_sets_project_hash_idx" ON "plan_sets" USING btree ("project_id","content_hash");--> statement-breakpoint
ALTER TABLE "sheets" ADD CONSTRAINT "sheets_count_role" CHECK ("sheets"."count_role" in ('counted', 'reference'));