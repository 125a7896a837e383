ALTER TABLE "gauge_readings" DROP CONSTRAINT "gauge_readings_revision_id_sheet_revisions_id_fk";
--> statement-breakpoint
DROP INDEX "gauge_readings_batch_idx";