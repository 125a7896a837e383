CREATE TYPE "public"."fluid_kind" AS ENUM('solvent', 'solution', 'oil', 'molten-metal', 'other');--> statement-breakpoint
CREATE TYPE "public"."process_kind" AS ENUM('drying-coat', 'cast-film', 'melt-pool', 'general-layer');--> statement-breakpoint
CREATE TABLE "fluids" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"kind" "fluid_kind" NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"definition" jsonb NOT NULL,
	"laws" jsonb NOT NULL,
	"reference_temperature" double precision NOT NULL,
	"density" double precision NOT NULL,
	"viscosity_at_reference" double precision NOT NULL,
	"surface_tension" double precision NOT NULL,
	"surface_tension_slope" double precision NOT NULL,
	"archived" boolean DEFAULT false NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "check_revisions" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"check_id" uuid NOT NULL,
	"revision" integer NOT NULL,
	"input" jsonb NOT NULL,
	"saved_by" uuid,
	"saved_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "layer_checks" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"title" text NOT NULL,
	"process_kind" "process_kind" NOT NULL,
	"fluid_id" uuid NOT NULL,
	"owner_id" uuid,
	"input" jsonb NOT NULL,
	"depth_text" text NOT NULL,
	"depth_si" double precision NOT NULL,
	"saved_margin" double precision,
	"saved_regime" text,
	"revision" integer DEFAULT 1 NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "fluids" ADD CONSTRAINT "fluids_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "check_revisions" ADD CONSTRAINT "check_revisions_check_id_layer_checks_id_fk" FOREIGN KEY ("check_id") REFERENCES "public"."layer_checks"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "check_revisions" ADD CONSTRAINT "check_revisions_saved_by_users_id_fk" FOREIGN KEY ("saved_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "layer_checks" ADD CONSTRAINT "layer_checks_fluid_id_fluids_id_fk" FOREIGN KEY ("fluid_id") REFERENCES "public"."fluids"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "layer_checks" ADD CONSTRAINT "layer_checks_owner_id_users_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "fluids_name_lower_idx" ON "fluids" USING btree (lower("name"));--> statement-breakpoint
CREATE INDEX "fluids_kind_idx" ON "fluids" USING btree ("kind");--> statement-breakpoint
CREATE UNIQUE INDEX "check_revisions_check_revision_unique" ON "check_revisions" USING btree ("check_id","revision");--> statement-breakpoint
CREATE INDEX "layer_checks_updated_at_idx" ON "layer_checks" USING btree ("updated_at");--> statement-breakpoint
CREATE INDEX "layer_checks_title_lower_idx" ON "layer_checks" USING btree (lower("title"));--> statement-breakpoint
CREATE INDEX "layer_checks_fluid_idx" ON "layer_checks" USING btree ("fluid_id");--> statement-breakpoint
CREATE INDEX "layer_checks_process_kind_idx" ON "layer_checks" USING btree ("process_kind","updated_at");--> statement-breakpoint
CREATE INDEX "layer_checks_depth_idx" ON "layer_checks" USING btree ("depth_si");--> statement-breakpoint
CREATE INDEX "layer_checks_margin_idx" ON "layer_checks" USING btree ("saved_margin");