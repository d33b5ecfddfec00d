ALTER TABLE "adjustments" ADD COLUMN "revision" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "photos" ADD COLUMN "revision" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "readings" ADD COLUMN "revision" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "visit_comments" ADD COLUMN "revision" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "visit_events" ADD COLUMN "revision" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "visits" ADD COLUMN "revision" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
CREATE INDEX "readings_visit_revision_idx" ON "readings" USING btree ("visit_id","revision");--> statement-breakpoint
-- Each row of a visit's run log carries the visit's revision at its last write (insert, void,
-- import commit), so "what changed since revision R" is "revision > R". A trigger stamps it, so
-- no write path can forget; server/visits/write-to-visit.ts bumps the visit's revision first,
-- under the row lock, so the stamp is the new revision.
CREATE FUNCTION "stamp_visit_revision"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  NEW.revision := coalesce((SELECT v.revision FROM visits v WHERE v.id = NEW.visit_id), 0);
  RETURN NEW;
END;
$$;--> statement-breakpoint
-- Rows a CSV import is still staging are not records yet: they are stamped when the import commits them.
CREATE TRIGGER "readings_stamp_revision" BEFORE INSERT OR UPDATE ON "readings" FOR EACH ROW WHEN (NEW.pending_import_id IS NULL) EXECUTE FUNCTION "stamp_visit_revision"();--> statement-breakpoint
CREATE TRIGGER "adjustments_stamp_revision" BEFORE INSERT OR UPDATE ON "adjustments" FOR EACH ROW EXECUTE FUNCTION "stamp_visit_revision"();--> statement-breakpoint
CREATE TRIGGER "visit_comments_stamp_revision" BEFORE INSERT OR UPDATE ON "visit_comments" FOR EACH ROW EXECUTE FUNCTION "stamp_visit_revision"();--> statement-breakpoint
CREATE TRIGGER "photos_stamp_revision" BEFORE INSERT OR UPDATE ON "photos" FOR EACH ROW EXECUTE FUNCTION "stamp_visit_revision"();--> statement-breakpoint
CREATE TRIGGER "visit_events_stamp_revision" BEFORE INSERT OR UPDATE ON "visit_events" FOR EACH ROW EXECUTE FUNCTION "stamp_visit_revision"();
