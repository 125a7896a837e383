CREATE TYPE "public"."gauge_direction" AS ENUM('md', 'cd');--> statement-breakpoint
CREATE TYPE "public"."gauge_flag" AS ENUM('quiet', 'close', 'over');--> statement-breakpoint
CREATE TYPE "public"."gauge_note_state" AS ENUM('open', 'dispositioned', 'closed');--> statement-breakpoint
CREATE TYPE "public"."gauge_source" AS ENUM('upload', 'device');--> statement-breakpoint
CREATE TYPE "public"."gauge_thickness_basis" AS ENUM('wet', 'dry');--> statement-breakpoint
CREATE TABLE "gauge_batches" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"revision_id" uuid NOT NULL,
	"source" "gauge_source" NOT NULL,
	"client_batch_id" text NOT NULL,
	"token_id" uuid,
	"uploaded_by" uuid,
	"file_name" text,
	"gauge_type" text,
	"calibration_date" date,
	"thickness_basis" "gauge_thickness_basis" DEFAULT 'wet' NOT NULL,
	"volume_solids" double precision,
	"thinner" double precision,
	"reading_count" integer NOT NULL,
	"quiet_count" integer NOT NULL,
	"close_count" integer NOT NULL,
	"over_count" integer NOT NULL,
	"worst_margin" double precision,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "gauge_notes" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"revision_id" uuid NOT NULL,
	"run" text NOT NULL,
	"state" "gauge_note_state" DEFAULT 'open' NOT NULL,
	"owner_id" uuid NOT NULL,
	"opened_at" timestamp with time zone DEFAULT now() NOT NULL,
	"over_count" integer NOT NULL,
	"worst_margin" double precision,
	"disposition" text,
	"disposition_by" uuid,
	"disposition_at" timestamp with time zone,
	"closed_by" uuid,
	"closed_by_name" text,
	"closed_by_role" "role",
	"close_meaning" text,
	"closed_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "gauge_readings" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"batch_id" uuid NOT NULL,
	"revision_id" uuid NOT NULL,
	"sequence" integer NOT NULL,
	"run" text NOT NULL,
	"position" double precision,
	"measured_at" timestamp with time zone,
	"direction" "gauge_direction",
	"entered_thickness" double precision NOT NULL,
	"entered_unit" text NOT NULL,
	"wet_thickness" double precision NOT NULL,
	"substrate_temperature" double precision,
	"air_temperature" double precision,
	"operator" text,
	"source" "gauge_source" NOT NULL,
	"margin" double precision,
	"flag" "gauge_flag" NOT NULL
);
--> statement-breakpoint
CREATE TABLE "gauge_tokens" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"sheet_id" uuid NOT NULL,
	"line" text NOT NULL,
	"label" text NOT NULL,
	"token_hash" text NOT NULL,
	"token_prefix" text NOT NULL,
	"created_by" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"last_used_at" timestamp with time zone,
	"revoked_at" timestamp with time zone,
	"revoked_by" uuid
);
--> statement-breakpoint
ALTER TABLE "gauge_batches" ADD CONSTRAINT "gauge_batches_revision_id_sheet_revisions_id_fk" FOREIGN KEY ("revision_id") REFERENCES "public"."sheet_revisions"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gauge_batches" ADD CONSTRAINT "gauge_batches_token_id_gauge_tokens_id_fk" FOREIGN KEY ("token_id") REFERENCES "public"."gauge_tokens"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gauge_batches" ADD CONSTRAINT "gauge_batches_uploaded_by_users_id_fk" FOREIGN KEY ("uploaded_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gauge_notes" ADD CONSTRAINT "gauge_notes_revision_id_sheet_revisions_id_fk" FOREIGN KEY ("revision_id") REFERENCES "public"."sheet_revisions"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gauge_notes" ADD CONSTRAINT "gauge_notes_owner_id_users_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gauge_notes" ADD CONSTRAINT "gauge_notes_disposition_by_users_id_fk" FOREIGN KEY ("disposition_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gauge_notes" ADD CONSTRAINT "gauge_notes_closed_by_users_id_fk" FOREIGN KEY ("closed_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gauge_readings" ADD CONSTRAINT "gauge_readings_batch_id_gauge_batches_id_fk" FOREIGN KEY ("batch_id") REFERENCES "public"."gauge_batches"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gauge_readings" ADD CONSTRAINT "gauge_readings_revision_id_sheet_revisions_id_fk" FOREIGN KEY ("revision_id") REFERENCES "public"."sheet_revisions"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gauge_tokens" ADD CONSTRAINT "gauge_tokens_sheet_id_process_sheets_id_fk" FOREIGN KEY ("sheet_id") REFERENCES "public"."process_sheets"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gauge_tokens" ADD CONSTRAINT "gauge_tokens_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gauge_tokens" ADD CONSTRAINT "gauge_tokens_revoked_by_users_id_fk" FOREIGN KEY ("revoked_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "gauge_batches_revision_idx" ON "gauge_batches" USING btree ("revision_id","created_at");--> statement-breakpoint
CREATE UNIQUE INDEX "gauge_batches_token_client_unique" ON "gauge_batches" USING btree ("token_id","client_batch_id") WHERE token_id is not null;--> statement-breakpoint
CREATE UNIQUE INDEX "gauge_notes_one_open_per_run" ON "gauge_notes" USING btree ("revision_id","run") WHERE state <> 'closed';--> statement-breakpoint
CREATE INDEX "gauge_notes_state_idx" ON "gauge_notes" USING btree ("state","opened_at");--> statement-breakpoint
CREATE INDEX "gauge_readings_revision_run_idx" ON "gauge_readings" USING btree ("revision_id","run","id");--> statement-breakpoint
CREATE INDEX "gauge_readings_revision_flag_idx" ON "gauge_readings" USING btree ("revision_id","flag","id");--> statement-breakpoint
CREATE INDEX "gauge_readings_batch_idx" ON "gauge_readings" USING btree ("batch_id");--> statement-breakpoint
CREATE UNIQUE INDEX "gauge_tokens_hash_unique" ON "gauge_tokens" USING btree ("token_hash");--> statement-breakpoint
CREATE INDEX "gauge_tokens_sheet_idx" ON "gauge_tokens" USING btree ("sheet_id");