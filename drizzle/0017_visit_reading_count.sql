CREATE TABLE "visit_reading_recorders" (
	"visit_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	"last_recorded_at" timestamp with time zone NOT NULL,
	CONSTRAINT "visit_reading_recorders_visit_id_user_id_pk" PRIMARY KEY("visit_id","user_id")
);
--> statement-breakpoint
ALTER TABLE "equipment" ADD COLUMN "site_sort_name" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "equipment" ADD COLUMN "customer_sort_name" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "visits" ADD COLUMN "reading_count" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "visit_reading_recorders" ADD CONSTRAINT "visit_reading_recorders_visit_id_visits_id_fk" FOREIGN KEY ("visit_id") REFERENCES "public"."visits"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "visit_reading_recorders" ADD CONSTRAINT "visit_reading_recorders_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "equipment_organisation_place_idx" ON "equipment" USING btree ("organisation_id","site_sort_name","customer_sort_name",lower("name"),"id") WHERE NOT "equipment"."archived";--> statement-breakpoint
CREATE INDEX "visits_organisation_status_started_idx" ON "visits" USING btree ("organisation_id","status","started_at");--> statement-breakpoint
-- ============================================================================================
-- Hand-written (visit_reading_count): the lists' per-visit reading figures and the equipment
-- list's place names, kept by triggers, and their backfill. Nothing above this block depends on it.
-- ============================================================================================
-- A reading counts when it is a record (not a row a CSV import is still staging) and not voided,
-- as countsInResults in server/db/visits.ts; a recorder's latest time counts every record, voided
-- ones too (what the jobs list read before these figures were stored). The triggers are per
-- statement, reading the changed rows from transition tables: an import of 10,000 readings
-- writes its visit's row once, not 10,000 times (PostgreSQL docs, CREATE TRIGGER, REFERENCING).
-- The recorders of these visits worked out again from their readings: after a record is lost
-- (deleted, its recorder set null, made a staged row again), where a later time cannot just win.
CREATE FUNCTION "refresh_visit_reading_recorders"(visit_ids uuid[], user_ids uuid[]) RETURNS void LANGUAGE sql AS $$
  DELETE FROM visit_reading_recorders r USING unnest(visit_ids, user_ids) AS lost(visit_id, user_id)
    WHERE r.visit_id = lost.visit_id AND r.user_id = lost.user_id;
  INSERT INTO visit_reading_recorders (visit_id, user_id, last_recorded_at)
    SELECT lost.visit_id, lost.user_id, latest.at
    FROM (SELECT DISTINCT * FROM unnest(visit_ids, user_ids) AS pair(visit_id, user_id)) AS lost
    CROSS JOIN LATERAL (SELECT max(r.created_at) AS at FROM readings r WHERE r.visit_id = lost.visit_id AND r.recorded_by = lost.user_id AND r.pending_import_id IS NULL) AS latest
    WHERE latest.at IS NOT NULL;
$$;--> statement-breakpoint
CREATE FUNCTION "readings_inserted_figures"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  UPDATE visits v SET reading_count = v.reading_count + added.n
    FROM (SELECT visit_id, count(*) AS n FROM new_readings WHERE pending_import_id IS NULL AND voided_at IS NULL GROUP BY visit_id) AS added
    WHERE v.id = added.visit_id;
  INSERT INTO visit_reading_recorders (visit_id, user_id, last_recorded_at)
    SELECT visit_id, recorded_by, max(created_at) FROM new_readings WHERE pending_import_id IS NULL AND recorded_by IS NOT NULL GROUP BY visit_id, recorded_by
    ON CONFLICT (visit_id, user_id) DO UPDATE SET last_recorded_at = excluded.last_recorded_at
    WHERE excluded.last_recorded_at > visit_reading_recorders.last_recorded_at;
  RETURN NULL;
END;
$$;--> statement-breakpoint
-- A void, an import's commit, a rewritten result: each visit's count moves by the rows that
-- started or stopped counting (none for a rewrite, which then writes nothing).
CREATE FUNCTION "readings_updated_figures"() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE
  lost_visits uuid[];
  lost_users uuid[];
BEGIN
  UPDATE visits v SET reading_count = v.reading_count + change.n
    FROM (SELECT visit_id, sum(n) AS n FROM (
            SELECT visit_id, 1 AS n FROM new_readings WHERE pending_import_id IS NULL AND voided_at IS NULL
            UNION ALL
            SELECT visit_id, -1 AS n FROM old_readings WHERE pending_import_id IS NULL AND voided_at IS NULL) AS counted
          GROUP BY visit_id HAVING sum(n) <> 0) AS change
    WHERE v.id = change.visit_id;
  INSERT INTO visit_reading_recorders (visit_id, user_id, last_recorded_at)
    SELECT visit_id, recorded_by, max(created_at) FROM new_readings WHERE pending_import_id IS NULL AND recorded_by IS NOT NULL GROUP BY visit_id, recorded_by
    ON CONFLICT (visit_id, user_id) DO UPDATE SET last_recorded_at = excluded.last_recorded_at
    WHERE excluded.last_recorded_at > visit_reading_recorders.last_recorded_at;
  SELECT array_agg(o.visit_id), array_agg(o.recorded_by) INTO lost_visits, lost_users
    FROM old_readings o JOIN new_readings n ON n.id = o.id
    WHERE o.pending_import_id IS NULL AND o.recorded_by IS NOT NULL
      AND (n.pending_import_id IS NOT NULL OR n.visit_id <> o.visit_id OR n.recorded_by IS DISTINCT FROM o.recorded_by OR n.created_at <> o.created_at);
  IF lost_visits IS NOT NULL THEN
    PERFORM refresh_visit_reading_recorders(lost_visits, lost_users);
  END IF;
  RETURN NULL;
END;
$$;--> statement-breakpoint
-- Deleted readings: a staged import thrown away (never counted), or a visit or company deleted.
CREATE FUNCTION "readings_deleted_figures"() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE
  lost_visits uuid[];
  lost_users uuid[];
BEGIN
  UPDATE visits v SET reading_count = v.reading_count - removed.n
    FROM (SELECT visit_id, count(*) AS n FROM old_readings WHERE pending_import_id IS NULL AND voided_at IS NULL GROUP BY visit_id) AS removed
    WHERE v.id = removed.visit_id;
  SELECT array_agg(visit_id), array_agg(recorded_by) INTO lost_visits, lost_users
    FROM old_readings WHERE pending_import_id IS NULL AND recorded_by IS NOT NULL;
  IF lost_visits IS NOT NULL THEN
    PERFORM refresh_visit_reading_recorders(lost_visits, lost_users);
  END IF;
  RETURN NULL;
END;
$$;--> statement-breakpoint
-- The readings there already are, before the triggers exist.
UPDATE visits v SET reading_count = counted.n
  FROM (SELECT visit_id, count(*) AS n FROM readings WHERE pending_import_id IS NULL AND voided_at IS NULL GROUP BY visit_id) AS counted
  WHERE v.id = counted.visit_id;--> statement-breakpoint
INSERT INTO visit_reading_recorders (visit_id, user_id, last_recorded_at)
  SELECT visit_id, recorded_by, max(created_at) FROM readings WHERE pending_import_id IS NULL AND recorded_by IS NOT NULL GROUP BY visit_id, recorded_by;--> statement-breakpoint
CREATE TRIGGER "readings_inserted_figures" AFTER INSERT ON "readings" REFERENCING NEW TABLE AS new_readings
  FOR EACH STATEMENT EXECUTE FUNCTION "readings_inserted_figures"();--> statement-breakpoint
CREATE TRIGGER "readings_updated_figures" AFTER UPDATE ON "readings" REFERENCING OLD TABLE AS old_readings NEW TABLE AS new_readings
  FOR EACH STATEMENT EXECUTE FUNCTION "readings_updated_figures"();--> statement-breakpoint
CREATE TRIGGER "readings_deleted_figures" AFTER DELETE ON "readings" REFERENCING OLD TABLE AS old_readings
  FOR EACH STATEMENT EXECUTE FUNCTION "readings_deleted_figures"();--> statement-breakpoint
-- The equipment list's "Place" sort keys, written beside the search text by the trigger that
-- already reads the unit's site and customer (migration list_search), so a site's or customer's
-- rename, which works that text out again, rewrites them too.
CREATE OR REPLACE FUNCTION "equipment_fill_search_text"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  SELECT search_compact(concat_ws(' ', NEW.name, NEW.kind, s.name, c.name, NEW.refrigerant, NEW.location, NEW.maker, NEW.model, NEW.serial)), lower(s.name), lower(c.name)
    INTO NEW.search_text, NEW.site_sort_name, NEW.customer_sort_name
    FROM sites s JOIN customers c ON c.id = s.customer_id WHERE s.id = NEW.site_id;
  RETURN NEW;
END;
$$;--> statement-breakpoint
UPDATE equipment e SET site_sort_name = lower(s.name), customer_sort_name = lower(c.name)
  FROM sites s JOIN customers c ON c.id = s.customer_id WHERE s.id = e.site_id;
