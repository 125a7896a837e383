CREATE TYPE "public"."spread_status" AS ENUM('queued', 'running', 'done', 'failed');--> statement-breakpoint
CREATE TABLE "drying_setups" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"check_id" uuid NOT NULL,
	"revision" integer NOT NULL,
	"title" text NOT NULL,
	"input" jsonb NOT NULL,
	"result_summary" jsonb NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "heats" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"heat_number" text NOT NULL,
	"supplier" text DEFAULT '' NOT NULL,
	"product" text DEFAULT '' NOT NULL,
	"sulfur_wt_percent" double precision NOT NULL,
	"sulfur_text" text NOT NULL,
	"oxygen_wt_percent" double precision,
	"oxygen_text" text,
	"notes" text DEFAULT '' NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "heats_sulfur_range" CHECK ("heats"."sulfur_wt_percent" >= 0 and "heats"."sulfur_wt_percent" <= 1),
	CONSTRAINT "heats_oxygen_range" CHECK ("heats"."oxygen_wt_percent" is null or ("heats"."oxygen_wt_percent" >= 0 and "heats"."oxygen_wt_percent" <= 1))
);
--> statement-breakpoint
CREATE TABLE "melt_pool_setups" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"check_id" uuid NOT NULL,
	"revision" integer NOT NULL,
	"input" jsonb NOT NULL,
	"first_heat_id" uuid,
	"second_heat_id" uuid,
	"result_summary" jsonb NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "property_spread_chunks" (
	"spread_id" uuid NOT NULL,
	"start" integer NOT NULL,
	"end" integer NOT NULL,
	"chunk" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "property_spread_chunks_spread_id_start_pk" PRIMARY KEY("spread_id","start")
);
--> statement-breakpoint
CREATE TABLE "property_spreads" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"check_id" uuid NOT NULL,
	"revision" integer NOT NULL,
	"status" "spread_status" NOT NULL,
	"samples" integer NOT NULL,
	"seed" bigint NOT NULL,
	"chunk_size" integer NOT NULL,
	"uncertainties" jsonb NOT NULL,
	"layer" jsonb NOT NULL,
	"plan" jsonb NOT NULL,
	"evaluator" jsonb,
	"evaluated_samples" integer DEFAULT 0 NOT NULL,
	"result" jsonb,
	"error" text,
	"job_id" text,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"finished_at" timestamp with time zone,
	CONSTRAINT "property_spreads_samples_range" CHECK ("property_spreads"."samples" between 1 and 1000000),
	CONSTRAINT "property_spreads_evaluated_range" CHECK ("property_spreads"."evaluated_samples" between 0 and "property_spreads"."samples")
);
--> statement-breakpoint
ALTER TABLE "drying_setups" ADD CONSTRAINT "drying_setups_check_id_layer_checks_id_fk" FOREIGN KEY ("check_id") REFERENCES "public"."layer_checks"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "drying_setups" ADD CONSTRAINT "drying_setups_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "heats" ADD CONSTRAINT "heats_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "melt_pool_setups" ADD CONSTRAINT "melt_pool_setups_check_id_layer_checks_id_fk" FOREIGN KEY ("check_id") REFERENCES "public"."layer_checks"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "melt_pool_setups" ADD CONSTRAINT "melt_pool_setups_first_heat_id_heats_id_fk" FOREIGN KEY ("first_heat_id") REFERENCES "public"."heats"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "melt_pool_setups" ADD CONSTRAINT "melt_pool_setups_second_heat_id_heats_id_fk" FOREIGN KEY ("second_heat_id") REFERENCES "public"."heats"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "melt_pool_setups" ADD CONSTRAINT "melt_pool_setups_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "property_spread_chunks" ADD CONSTRAINT "property_spread_chunks_spread_id_property_spreads_id_fk" FOREIGN KEY ("spread_id") REFERENCES "public"."property_spreads"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "property_spreads" ADD CONSTRAINT "property_spreads_check_id_layer_checks_id_fk" FOREIGN KEY ("check_id") REFERENCES "public"."layer_checks"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "property_spreads" ADD CONSTRAINT "property_spreads_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "drying_setups_check_idx" ON "drying_setups" USING btree ("check_id","revision","created_at");--> statement-breakpoint
CREATE UNIQUE INDEX "heats_heat_number_unique" ON "heats" USING btree (lower("heat_number"));--> statement-breakpoint
CREATE INDEX "melt_pool_setups_check_idx" ON "melt_pool_setups" USING btree ("check_id","revision","created_at");--> statement-breakpoint
CREATE INDEX "property_spreads_check_idx" ON "property_spreads" USING btree ("check_id","revision","created_at");--> statement-breakpoint
CREATE INDEX "property_spreads_status_idx" ON "property_spreads" USING btree ("status");