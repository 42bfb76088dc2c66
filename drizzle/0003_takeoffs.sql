CREATE TYPE "public"."takeoff_status" AS ENUM('draft', 'submitted');--> statement-breakpoint
CREATE TABLE "takeoffs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"project_id" uuid NOT NULL,
	"name" text NOT NULL,
	"note" text,
	"price_book_id" uuid,
	"status" "takeoff_status" DEFAULT 'draft' NOT NULL,
	"inputs" jsonb NOT NULL,
	"prices" jsonb NOT NULL,
	"result" jsonb NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"submitted_at" timestamp with time zone,
	"submitted_by" uuid
);
--> statement-breakpoint
ALTER TABLE "organisations" ADD COLUMN "takeoff_settings" jsonb;--> statement-breakpoint
ALTER TABLE "takeoffs" ADD CONSTRAINT "takeoffs_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "takeoffs" ADD CONSTRAINT "takeoffs_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "takeoffs" ADD CONSTRAINT "takeoffs_price_book_id_price_books_id_fk" FOREIGN KEY ("price_book_id") REFERENCES "public"."price_books"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "takeoffs" ADD CONSTRAINT "takeoffs_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "takeoffs" ADD CONSTRAINT "takeoffs_submitted_by_users_id_fk" FOREIGN KEY ("submitted_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "takeoffs_project_idx" ON "takeoffs" USING btree ("project_id","created_at");