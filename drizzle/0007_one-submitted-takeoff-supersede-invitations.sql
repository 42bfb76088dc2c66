ALTER TABLE "invitations" ADD COLUMN "superseded_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "invitations" ADD COLUMN "superseded_by" uuid;--> statement-breakpoint
ALTER TABLE "invitations" ADD CONSTRAINT "invitations_superseded_by_invitations_id_fk" FOREIGN KEY ("superseded_by") REFERENCES "public"."invitations"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
-- Back-fill (hand-added before the indexes): an address with several live invitations keeps only its newest.
UPDATE "invitations" i SET "superseded_at" = now()
 WHERE i."used_at" IS NULL AND i."revoked_at" IS NULL AND i."superseded_at" IS NULL AND EXISTS (SELECT 1 FROM "invitations" j
   WHERE j."org_id" = i."org_id" AND j."email" = i."email" AND j."used_at" IS NULL AND j."revoked_at" IS NULL AND j."superseded_at" IS NULL
   AND (j."created_at", j."id") > (i."created_at", i."id"));--> statement-breakpoint
-- A project with several submitted takeoffs keeps its latest as the bid; the others go back to draft.
UPDATE "takeoffs" t SET "status" = 'draft', "submitted_at" = NULL, "submitted_by" = NULL
 WHERE t."status" = 'submitted' AND EXISTS (SELECT 1 FROM "takeoffs" u WHERE u."project_id" = t."project_id" AND u."status" = 'submitted'
   AND (coalesce(u."submitted_at", u."created_at"), u."id") > (coalesce(t."submitted_at", t."created_at"), t."id"));--> statement-breakpoint
UPDATE "projects" p SET "status" = 'submitted' WHERE "status" = 'draft' AND EXISTS (SELECT 1 FROM "takeoffs" t WHERE t."project_id" = p."id" AND t."status" = 'submitted');--> statement-breakpoint
UPDATE "projects" p SET "status" = 'draft' WHERE "status" <> 'draft' AND NOT EXISTS (SELECT 1 FROM "takeoffs" t WHERE t."project_id" = p."id" AND t."status" = 'submitted');--> statement-breakpoint
CREATE UNIQUE INDEX "invitations_one_live_per_address" ON "invitations" USING btree ("org_id","email") WHERE "invitations"."used_at" is null and "invitations"."revoked_at" is null and "invitations"."superseded_at" is null;--> statement-breakpoint
CREATE UNIQUE INDEX "takeoffs_one_submitted_per_project" ON "takeoffs" USING btree ("project_id") WHERE "takeoffs"."status" = 'submitted';