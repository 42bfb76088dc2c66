ALTER TABLE "takeoffs" ADD COLUMN "input_hash" text;--> statement-breakpoint
CREATE INDEX "takeoffs_input_hash_idx" ON "takeoffs" USING btree ("org_id","input_hash");