CREATE TABLE "takeoff_sends" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"org_id" uuid NOT NULL,
	"takeoff_id" uuid NOT NULL,
	"to" text NOT NULL,
	"subject" text NOT NULL,
	"sent_by" uuid,
	"sent_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "takeoff_sends" ADD CONSTRAINT "takeoff_sends_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "takeoff_sends" ADD CONSTRAINT "takeoff_sends_takeoff_id_takeoffs_id_fk" FOREIGN KEY ("takeoff_id") REFERENCES "public"."takeoffs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "takeoff_sends" ADD CONSTRAINT "takeoff_sends_sent_by_users_id_fk" FOREIGN KEY ("sent_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "takeoff_sends_takeoff_idx" ON "takeoff_sends" USING btree ("takeoff_id","sent_at");