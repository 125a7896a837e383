CREATE TYPE "public"."sheet_state" AS ENUM('draft', 'awaiting-review', 'returned', 'signed', 'superseded');--> statement-breakpoint
CREATE TABLE "process_sheets" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"number" text NOT NULL,
	"site_code" text NOT NULL,
	"check_id" uuid NOT NULL,
	"created_by" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "sheet_number_counters" (
	"site_code" text PRIMARY KEY NOT NULL,
	"last_number" integer NOT NULL
);
--> statement-breakpoint
CREATE TABLE "sheet_returns" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"revision_id" uuid NOT NULL,
	"reviewer_id" uuid NOT NULL,
	"reviewer_name" text NOT NULL,
	"comments" text NOT NULL,
	"returned_at" timestamp with time zone NOT NULL
);
--> statement-breakpoint
CREATE TABLE "sheet_revisions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"sheet_id" uuid NOT NULL,
	"revision" integer NOT NULL,
	"state" "sheet_state" DEFAULT 'draft' NOT NULL,
	"title" text NOT NULL,
	"line" text NOT NULL,
	"purpose" text NOT NULL,
	"author_id" uuid NOT NULL,
	"check_revision" integer NOT NULL,
	"snapshot" jsonb NOT NULL,
	"solver_version" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"submitted_at" timestamp with time zone,
	"decided_at" timestamp with time zone,
	"signed_pdf" "bytea",
	"pdf_sha256" text
);
--> statement-breakpoint
CREATE TABLE "sheet_signatures" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"revision_id" uuid NOT NULL,
	"signer_id" uuid NOT NULL,
	"printed_name" text NOT NULL,
	"signer_role" "role" NOT NULL,
	"meaning" text NOT NULL,
	"signed_at" timestamp with time zone NOT NULL,
	"pdf_sha256" text NOT NULL
);
--> statement-breakpoint
ALTER TABLE "process_sheets" ADD CONSTRAINT "process_sheets_check_id_layer_checks_id_fk" FOREIGN KEY ("check_id") REFERENCES "public"."layer_checks"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "process_sheets" ADD CONSTRAINT "process_sheets_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sheet_returns" ADD CONSTRAINT "sheet_returns_revision_id_sheet_revisions_id_fk" FOREIGN KEY ("revision_id") REFERENCES "public"."sheet_revisions"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sheet_returns" ADD CONSTRAINT "sheet_returns_reviewer_id_users_id_fk" FOREIGN KEY ("reviewer_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sheet_revisions" ADD CONSTRAINT "sheet_revisions_sheet_id_process_sheets_id_fk" FOREIGN KEY ("sheet_id") REFERENCES "public"."process_sheets"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sheet_revisions" ADD CONSTRAINT "sheet_revisions_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sheet_signatures" ADD CONSTRAINT "sheet_signatures_revision_id_sheet_revisions_id_fk" FOREIGN KEY ("revision_id") REFERENCES "public"."sheet_revisions"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sheet_signatures" ADD CONSTRAINT "sheet_signatures_signer_id_users_id_fk" FOREIGN KEY ("signer_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "process_sheets_number_unique" ON "process_sheets" USING btree ("number");--> statement-breakpoint
CREATE INDEX "sheet_returns_revision_idx" ON "sheet_returns" USING btree ("revision_id");--> statement-breakpoint
CREATE UNIQUE INDEX "sheet_revisions_sheet_revision_unique" ON "sheet_revisions" USING btree ("sheet_id","revision");--> statement-breakpoint
CREATE UNIQUE INDEX "sheet_revisions_pdf_sha256_unique" ON "sheet_revisions" USING btree ("pdf_sha256") WHERE pdf_sha256 is not null;--> statement-breakpoint
CREATE INDEX "sheet_revisions_state_idx" ON "sheet_revisions" USING btree ("state","created_at");--> statement-breakpoint
CREATE INDEX "sheet_revisions_author_idx" ON "sheet_revisions" USING btree ("author_id");--> statement-breakpoint
CREATE INDEX "sheet_revisions_line_idx" ON "sheet_revisions" USING btree ("line");--> statement-breakpoint
CREATE UNIQUE INDEX "sheet_signatures_revision_unique" ON "sheet_signatures" USING btree ("revision_id");--> statement-breakpoint
CREATE INDEX "sheet_signatures_sha_idx" ON "sheet_signatures" USING btree ("pdf_sha256");