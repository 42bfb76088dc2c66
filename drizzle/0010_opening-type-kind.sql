ALTER TABLE "opening_types" ADD COLUMN "kind" text DEFAULT 'window' NOT NULL;--> statement-breakpoint
ALTER TABLE "opening_types" ADD COLUMN "shape" jsonb;