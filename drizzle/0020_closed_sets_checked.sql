-- Closed sets (roles, statuses, kinds, the equipment's application) are checked by the database
-- against the zod schemas' own lists (server/db/schema.ts, oneOf). The two earlier checks are
-- written again only because drizzle now names their column with its table.
ALTER TABLE "charge_references" DROP CONSTRAINT "charge_references_source_known";--> statement-breakpoint
ALTER TABLE "visit_events" DROP CONSTRAINT "visit_events_action_known";--> statement-breakpoint
ALTER TABLE "casebook_attempts" ADD CONSTRAINT "casebook_attempts_expected_state_known" CHECK ("casebook_attempts"."expected_state" in ('normal', 'undercharged', 'overcharged', 'restricted-metering', 'low-evaporator-airflow', 'overfeeding-metering', 'condenser-airflow', 'non-condensables', 'weak-compressor', 'insufficient-data'));--> statement-breakpoint
ALTER TABLE "casebook_cases" ADD CONSTRAINT "casebook_cases_difficulty_known" CHECK ("casebook_cases"."difficulty" in ('starter', 'intermediate', 'advanced'));--> statement-breakpoint
ALTER TABLE "casebook_cases" ADD CONSTRAINT "casebook_cases_status_known" CHECK ("casebook_cases"."status" in ('draft', 'published'));--> statement-breakpoint
ALTER TABLE "charge_references" ADD CONSTRAINT "charge_references_source_known" CHECK ("charge_references"."source" in ('weigh-in', 'set-by-senior'));--> statement-breakpoint
ALTER TABLE "cylinders" ADD CONSTRAINT "cylinders_kind_known" CHECK ("cylinders"."kind" in ('recovery', 'new', 'reclaimed'));--> statement-breakpoint
ALTER TABLE "equipment" ADD CONSTRAINT "equipment_application_known" CHECK ("equipment"."application" in ('comfort-cooling', 'heat-pump', 'medium-temperature-refrigeration', 'low-temperature-refrigeration', 'process-chilling'));--> statement-breakpoint
ALTER TABLE "invitations" ADD CONSTRAINT "invitations_role_known" CHECK ("invitations"."role" in ('owner', 'senior', 'technician', 'apprentice'));--> statement-breakpoint
ALTER TABLE "refrigerant_movements" ADD CONSTRAINT "refrigerant_movements_kind_known" CHECK ("refrigerant_movements"."kind" in ('recovered', 'reused', 'added-new', 'added-reclaimed', 'sent-for-reclaim'));--> statement-breakpoint
ALTER TABLE "users" ADD CONSTRAINT "users_role_known" CHECK ("users"."role" in ('owner', 'senior', 'technician', 'apprentice'));--> statement-breakpoint
ALTER TABLE "visit_events" ADD CONSTRAINT "visit_events_record_kind_known" CHECK ("visit_events"."record_kind" is null or "visit_events"."record_kind" in ('reading', 'adjustment', 'electrical-check', 'leak-search', 'standing-pressure', 'pressure-test', 'evacuation', 'movement', 'charging'));--> statement-breakpoint
ALTER TABLE "visit_events" ADD CONSTRAINT "visit_events_action_known" CHECK ("visit_events"."action" in ('started', 'submitted', 'signed-off', 'sent-back', 'reopened', 'voided', 'imported', 'charge-reference-set'));--> statement-breakpoint
ALTER TABLE "visits" ADD CONSTRAINT "visits_status_known" CHECK ("visits"."status" in ('open', 'awaiting-review', 'signed-off', 'sent-back'));