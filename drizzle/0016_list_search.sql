CREATE TABLE "visit_search" (
	"visit_id" uuid PRIMARY KEY NOT NULL,
	"organisation_id" uuid NOT NULL,
	"search_text" text NOT NULL,
	"unit_name" text NOT NULL,
	"reason" text NOT NULL
);
--> statement-breakpoint
DROP INDEX "visits_status_idx";--> statement-breakpoint
ALTER TABLE "equipment" ADD COLUMN "search_text" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "visit_search" ADD CONSTRAINT "visit_search_visit_id_visits_id_fk" FOREIGN KEY ("visit_id") REFERENCES "public"."visits"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "visit_search" ADD CONSTRAINT "visit_search_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "visit_search_unit_name_idx" ON "visit_search" USING btree ("organisation_id","unit_name","visit_id");--> statement-breakpoint
CREATE INDEX "visit_search_reason_idx" ON "visit_search" USING btree ("organisation_id","reason","visit_id");--> statement-breakpoint
CREATE INDEX "equipment_organisation_name_idx" ON "equipment" USING btree ("organisation_id",lower("name"),"id") WHERE NOT "equipment"."archived";--> statement-breakpoint
CREATE INDEX "equipment_organisation_kind_idx" ON "equipment" USING btree ("organisation_id","kind",lower("name"),"id") WHERE NOT "equipment"."archived";--> statement-breakpoint
CREATE INDEX "equipment_organisation_refrigerant_idx" ON "equipment" USING btree ("organisation_id","refrigerant",lower("name"),"id") WHERE NOT "equipment"."archived";--> statement-breakpoint
CREATE INDEX "equipment_organisation_circuits_idx" ON "equipment" USING btree ("organisation_id",jsonb_array_length("circuits"),lower("name"),"id") WHERE NOT "equipment"."archived";--> statement-breakpoint
CREATE INDEX "refrigerant_movements_register_idx" ON "refrigerant_movements" USING btree ("organisation_id","at","created_at","id") WHERE "refrigerant_movements"."voided_at" is null;--> statement-breakpoint
CREATE INDEX "refrigerant_movements_technician_register_idx" ON "refrigerant_movements" USING btree ("organisation_id","technician_id","at","created_at","id") WHERE "refrigerant_movements"."voided_at" is null;--> statement-breakpoint
CREATE INDEX "visit_technicians_user_idx" ON "visit_technicians" USING btree ("user_id","visit_id");--> statement-breakpoint
CREATE INDEX "visits_status_idx" ON "visits" USING btree ("organisation_id","status","id");--> statement-breakpoint
-- ============================================================================================
-- Hand-written (list_search): the lists' search text kept by triggers, its trigram indexes,
-- and the factory-charge sort's index. Nothing above this block depends on it.
-- ============================================================================================
-- The text a search word is looked for in: lower-case, without the characters a refrigerant name
-- may or may not carry (space, hyphen, en dash, tab, line ends), as compactSearchText does in
-- shared/format/search-terms.ts. Every search rule there reduces to "this text contains the
-- word without dashes or a leading r" (see searchTerms), so one text and one index serve all.
CREATE FUNCTION "search_compact"(words text) RETURNS text LANGUAGE sql IMMUTABLE PARALLEL SAFE
  AS $$ SELECT translate(lower(words), ' -–' || chr(9) || chr(10) || chr(13), '') $$;--> statement-breakpoint
-- The one definition of what the jobs list searches and sorts a visit by.
CREATE VIEW "visit_search_source" AS
  SELECT v.id AS visit_id, v.organisation_id, v.equipment_id,
    search_compact(concat_ws(' ', e.name, s.name, c.name, e.refrigerant, v.reason)) AS search_text,
    lower(e.name) AS unit_name, lower(v.reason) AS reason
  FROM visits v JOIN equipment e ON e.id = v.equipment_id JOIN sites s ON s.id = e.site_id JOIN customers c ON c.id = s.customer_id;--> statement-breakpoint
CREATE FUNCTION "equipment_fill_search_text"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  SELECT search_compact(concat_ws(' ', NEW.name, NEW.kind, s.name, c.name, NEW.refrigerant, NEW.location, NEW.maker, NEW.model, NEW.serial))
    INTO NEW.search_text
    FROM sites s JOIN customers c ON c.id = s.customer_id WHERE s.id = NEW.site_id;
  RETURN NEW;
END;
$$;--> statement-breakpoint
-- A visit's row, written again whenever its unit, reason or unit's names change.
CREATE FUNCTION "visits_write_search"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  INSERT INTO visit_search (visit_id, organisation_id, search_text, unit_name, reason)
    SELECT visit_id, organisation_id, search_text, unit_name, reason FROM visit_search_source WHERE visit_id = NEW.id
    ON CONFLICT (visit_id) DO UPDATE SET search_text = excluded.search_text, unit_name = excluded.unit_name, reason = excluded.reason;
  RETURN NULL;
END;
$$;--> statement-breakpoint
CREATE FUNCTION "equipment_write_visit_search"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  UPDATE visit_search vs SET search_text = src.search_text, unit_name = src.unit_name, reason = src.reason
    FROM visit_search_source src WHERE src.equipment_id = NEW.id AND vs.visit_id = src.visit_id;
  RETURN NULL;
END;
$$;--> statement-breakpoint
-- A site or customer renamed: its units' text is worked out again (equipment_fill_search_text),
-- which in turn rewrites their visits' (equipment_write_visit_search).
CREATE FUNCTION "sites_refresh_search"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  UPDATE equipment SET search_text = '' WHERE site_id = NEW.id;
  RETURN NULL;
END;
$$;--> statement-breakpoint
CREATE FUNCTION "customers_refresh_search"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  UPDATE equipment SET search_text = '' WHERE site_id IN (SELECT id FROM sites WHERE customer_id = NEW.id);
  RETURN NULL;
END;
$$;--> statement-breakpoint
-- The rows there already are, before the triggers exist (each row written once).
UPDATE equipment e SET search_text = search_compact(concat_ws(' ', e.name, e.kind, s.name, c.name, e.refrigerant, e.location, e.maker, e.model, e.serial))
  FROM sites s JOIN customers c ON c.id = s.customer_id WHERE s.id = e.site_id;--> statement-breakpoint
INSERT INTO visit_search (visit_id, organisation_id, search_text, unit_name, reason)
  SELECT visit_id, organisation_id, search_text, unit_name, reason FROM visit_search_source;--> statement-breakpoint
CREATE TRIGGER "equipment_search_text" BEFORE INSERT OR UPDATE OF name, kind, site_id, refrigerant, location, maker, model, serial, search_text ON "equipment"
  FOR EACH ROW EXECUTE FUNCTION "equipment_fill_search_text"();--> statement-breakpoint
CREATE TRIGGER "equipment_visit_search" AFTER UPDATE OF name, site_id, refrigerant, search_text ON "equipment"
  FOR EACH ROW WHEN (OLD.name IS DISTINCT FROM NEW.name OR OLD.site_id IS DISTINCT FROM NEW.site_id OR OLD.refrigerant IS DISTINCT FROM NEW.refrigerant OR OLD.search_text IS DISTINCT FROM NEW.search_text)
  EXECUTE FUNCTION "equipment_write_visit_search"();--> statement-breakpoint
CREATE TRIGGER "visits_search" AFTER INSERT OR UPDATE OF equipment_id, reason ON "visits"
  FOR EACH ROW EXECUTE FUNCTION "visits_write_search"();--> statement-breakpoint
CREATE TRIGGER "sites_search" AFTER UPDATE OF name, customer_id ON "sites"
  FOR EACH ROW WHEN (OLD.name IS DISTINCT FROM NEW.name OR OLD.customer_id IS DISTINCT FROM NEW.customer_id)
  EXECUTE FUNCTION "sites_refresh_search"();--> statement-breakpoint
CREATE TRIGGER "customers_search" AFTER UPDATE OF name ON "customers"
  FOR EACH ROW WHEN (OLD.name IS DISTINCT FROM NEW.name)
  EXECUTE FUNCTION "customers_refresh_search"();--> statement-breakpoint
-- The equipment list's factory-charge sort: the circuits' charges summed (server/db/equipment.ts
-- sorts by this same function, so the planner reads the index in order).
CREATE FUNCTION "equipment_factory_charge_kg"(circuits jsonb) RETURNS numeric LANGUAGE sql IMMUTABLE PARALLEL SAFE
  AS $$ SELECT coalesce(sum((circuit ->> 'factoryChargeKg')::numeric), 0) FROM jsonb_array_elements(circuits) AS circuit $$;--> statement-breakpoint
CREATE INDEX "equipment_organisation_factory_charge_idx" ON "equipment" ("organisation_id", "equipment_factory_charge_kg"("circuits"), lower("name"), "id") WHERE NOT "archived";--> statement-breakpoint
-- Trigram indexes answer "contains" (LIKE '%word%') from the index. pg_trgm ships with PostgreSQL
-- (contrib; Debian's postgresql package) and with PGlite when it is loaded (server/db/client.ts);
-- where it is missing (drizzle-kit's own PGlite) the searches still work, unindexed.
DO $$
BEGIN
  IF EXISTS (SELECT 1 FROM pg_available_extensions WHERE name = 'pg_trgm') THEN
    CREATE EXTENSION IF NOT EXISTS pg_trgm;
    CREATE INDEX visit_search_text_trgm_idx ON visit_search USING gin (search_text gin_trgm_ops);
    CREATE INDEX equipment_search_text_trgm_idx ON equipment USING gin (search_text gin_trgm_ops);
  END IF;
END;
$$;
