-- Signed process sheets are records that must never change (21 CFR 11.10(c), 11.70; ISO 9001 §7.5.3):
-- the database itself rejects any UPDATE or DELETE of a Signed or Superseded revision (its snapshot,
-- its PDF, its hash), except the one allowed step Signed -> Superseded that changes the state column
-- and nothing else. Signatures and returns are append-only; sheet identities (number, check) never change.
CREATE OR REPLACE FUNCTION sheet_revisions_guard() RETURNS trigger
LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'DELETE' THEN
    IF OLD.state IN ('signed', 'superseded') THEN
      RAISE EXCEPTION 'sheet revision % is %: it cannot be deleted', OLD.id, OLD.state
        USING ERRCODE = 'insufficient_privilege';
    END IF;
    RETURN OLD;
  END IF;
  IF OLD.state IN ('signed', 'superseded') THEN
    IF OLD.state = 'signed' AND NEW.state = 'superseded'
       AND (to_jsonb(NEW) - 'state') = (to_jsonb(OLD) - 'state') THEN
      RETURN NEW;
    END IF;
    RAISE EXCEPTION 'sheet revision % is %: it cannot be changed (only Signed -> Superseded of the state alone is allowed)', OLD.id, OLD.state
      USING ERRCODE = 'insufficient_privilege';
  END IF;
  IF NEW.state = 'superseded' THEN
    RAISE EXCEPTION 'only a Signed sheet revision can become Superseded' USING ERRCODE = 'check_violation';
  END IF;
  IF NEW.state = 'signed' AND (NEW.signed_pdf IS NULL OR NEW.pdf_sha256 IS NULL
       OR NEW.pdf_sha256 <> encode(sha256(NEW.signed_pdf), 'hex')) THEN
    RAISE EXCEPTION 'a Signed sheet revision needs its signed PDF and the SHA-256 of exactly those bytes'
      USING ERRCODE = 'check_violation';
  END IF;
  RETURN NEW;
END;
$$;
--> statement-breakpoint
CREATE TRIGGER sheet_revisions_guard_update_delete
  BEFORE UPDATE OR DELETE ON sheet_revisions
  FOR EACH ROW EXECUTE FUNCTION sheet_revisions_guard();
--> statement-breakpoint
CREATE OR REPLACE FUNCTION sheet_records_reject_change() RETURNS trigger
LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION '% is append-only: % is not allowed', TG_TABLE_NAME, TG_OP
    USING ERRCODE = 'insufficient_privilege';
END;
$$;
--> statement-breakpoint
CREATE TRIGGER sheet_signatures_no_update_delete
  BEFORE UPDATE OR DELETE ON sheet_signatures
  FOR EACH ROW EXECUTE FUNCTION sheet_records_reject_change();
--> statement-breakpoint
CREATE TRIGGER sheet_returns_no_update_delete
  BEFORE UPDATE OR DELETE ON sheet_returns
  FOR EACH ROW EXECUTE FUNCTION sheet_records_reject_change();
--> statement-breakpoint
CREATE TRIGGER process_sheets_no_update_delete
  BEFORE UPDATE OR DELETE ON process_sheets
  FOR EACH ROW EXECUTE FUNCTION sheet_records_reject_change();
--> statement-breakpoint
CREATE TRIGGER sheet_revisions_no_truncate
  BEFORE TRUNCATE ON sheet_revisions
  FOR EACH STATEMENT EXECUTE FUNCTION sheet_records_reject_change();
--> statement-breakpoint
CREATE TRIGGER sheet_signatures_no_truncate
  BEFORE TRUNCATE ON sheet_signatures
  FOR EACH STATEMENT EXECUTE FUNCTION sheet_records_reject_change();
--> statement-breakpoint
CREATE TRIGGER sheet_returns_no_truncate
  BEFORE TRUNCATE ON sheet_returns
  FOR EACH STATEMENT EXECUTE FUNCTION sheet_records_reject_change();
--> statement-breakpoint
CREATE TRIGGER process_sheets_no_truncate
  BEFORE TRUNCATE ON process_sheets
  FOR EACH STATEMENT EXECUTE FUNCTION sheet_records_reject_change();
