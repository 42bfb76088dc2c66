CREATE TABLE "seed_marks" (
	"key" text PRIMARY KEY NOT NULL,
	"row_id" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
