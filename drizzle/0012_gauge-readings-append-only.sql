-- Gauge readings are QA records: once imported (upload or device post) they never change. QuietLayer
-- itself only ever inserts readings and their batches (the batch header holds the gauge, its
-- calibration date and the counts the alert reports), so the database rejects any UPDATE, DELETE or
-- TRUNCATE of either table. A wrong import is answered by a new batch, never by editing the old one.
CREATE OR REPLACE FUNCTION gauge_records_reject_change() RETURNS trigger
LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION '% is append-only: % is not allowed', TG_TABLE_NAME, TG_OP
    USING ERRCODE = 'insufficient_privilege';
END;
$$;
--> statement-breakpoint
CREATE TRIGGER gauge_readings_no_update_delete
  BEFORE UPDATE OR DELETE ON gauge_readings
  FOR EACH ROW EXECUTE FUNCTION gauge_records_reject_change();
--> statement-breakpoint
CREATE TRIGGER gauge_batches_no_update_delete
  BEFORE UPDATE OR DELETE ON gauge_batches
  FOR EACH ROW EXECUTE FUNCTION gauge_records_reject_change();
--> statement-breakpoint
CREATE TRIGGER gauge_readings_no_truncate
  BEFORE TRUNCATE ON gauge_readings
  FOR EACH STATEMENT EXECUTE FUNCTION gauge_records_reject_change();
--> statement-breakpoint
CREATE TRIGGER gauge_batches_no_truncate
  BEFORE TRUNCATE ON gauge_batches
  FOR EACH STATEMENT EXECUTE FUNCTION gauge_records_reject_change();
