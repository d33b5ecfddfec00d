CREATE TABLE "visit_events" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"visit_id" uuid NOT NULL,
	"action" text NOT NULL,
	"record_kind" text,
	"record_id" uuid,
	"summary" text NOT NULL,
	"reason" text,
	"actor_id" uuid,
	"at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "visit_events_action_known" CHECK (action in ('started', 'submitted', 'signed-off', 'sent-back', 'reopened', 'voided', 'imported'))
);
--> statement-breakpoint
DROP INDEX "circuit_charges_visit_circuit_unique";--> statement-breakpoint
ALTER TABLE "adjustments" ADD COLUMN "voided_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "adjustments" ADD COLUMN "voided_by" uuid;--> statement-breakpoint
ALTER TABLE "adjustments" ADD COLUMN "void_reason" text;--> statement-breakpoint
ALTER TABLE "casebook_cases" ADD COLUMN "version" integer DEFAULT 1 NOT NULL;--> statement-breakpoint
ALTER TABLE "circuit_charges" ADD COLUMN "voided_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "circuit_charges" ADD COLUMN "voided_by" uuid;--> statement-breakpoint
ALTER TABLE "circuit_charges" ADD COLUMN "void_reason" text;--> statement-breakpoint
ALTER TABLE "electrical_checks" ADD COLUMN "voided_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "electrical_checks" ADD COLUMN "voided_by" uuid;--> statement-breakpoint
ALTER TABLE "electrical_checks" ADD COLUMN "void_reason" text;--> statement-breakpoint
ALTER TABLE "evacuations" ADD COLUMN "version" integer DEFAULT 1 NOT NULL;--> statement-breakpoint
ALTER TABLE "evacuations" ADD COLUMN "voided_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "evacuations" ADD COLUMN "voided_by" uuid;--> statement-breakpoint
ALTER TABLE "evacuations" ADD COLUMN "void_reason" text;--> statement-breakpoint
ALTER TABLE "leak_searches" ADD COLUMN "voided_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "leak_searches" ADD COLUMN "voided_by" uuid;--> statement-breakpoint
ALTER TABLE "leak_searches" ADD COLUMN "void_reason" text;--> statement-breakpoint
ALTER TABLE "organisations" ADD COLUMN "settings_version" integer DEFAULT 1 NOT NULL;--> statement-breakpoint
ALTER TABLE "pressure_tests" ADD COLUMN "voided_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "pressure_tests" ADD COLUMN "voided_by" uuid;--> statement-breakpoint
ALTER TABLE "pressure_tests" ADD COLUMN "void_reason" text;--> statement-breakpoint
ALTER TABLE "readings" ADD COLUMN "pending_import_id" uuid;--> statement-breakpoint
ALTER TABLE "readings" ADD COLUMN "voided_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "readings" ADD COLUMN "voided_by" uuid;--> statement-breakpoint
ALTER TABLE "readings" ADD COLUMN "void_reason" text;--> statement-breakpoint
ALTER TABLE "refrigerant_movements" ADD COLUMN "voided_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "refrigerant_movements" ADD COLUMN "voided_by" uuid;--> statement-breakpoint
ALTER TABLE "refrigerant_movements" ADD COLUMN "void_reason" text;--> statement-breakpoint
ALTER TABLE "users" ADD COLUMN "profile_version" integer DEFAULT 1 NOT NULL;--> statement-breakpoint
ALTER TABLE "visit_events" ADD CONSTRAINT "visit_events_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "visit_events" ADD CONSTRAINT "visit_events_visit_id_visits_id_fk" FOREIGN KEY ("visit_id") REFERENCES "public"."visits"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "visit_events" ADD CONSTRAINT "visit_events_actor_id_users_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "visit_events_visit_idx" ON "visit_events" USING btree ("visit_id","at");--> statement-breakpoint
ALTER TABLE "adjustments" ADD CONSTRAINT "adjustments_voided_by_users_id_fk" FOREIGN KEY ("voided_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "circuit_charges" ADD CONSTRAINT "circuit_charges_voided_by_users_id_fk" FOREIGN KEY ("voided_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "electrical_checks" ADD CONSTRAINT "electrical_checks_voided_by_users_id_fk" FOREIGN KEY ("voided_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "evacuations" ADD CONSTRAINT "evacuations_voided_by_users_id_fk" FOREIGN KEY ("voided_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "leak_searches" ADD CONSTRAINT "leak_searches_voided_by_users_id_fk" FOREIGN KEY ("voided_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pressure_tests" ADD CONSTRAINT "pressure_tests_voided_by_users_id_fk" FOREIGN KEY ("voided_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "readings" ADD CONSTRAINT "readings_voided_by_users_id_fk" FOREIGN KEY ("voided_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "refrigerant_movements" ADD CONSTRAINT "refrigerant_movements_voided_by_users_id_fk" FOREIGN KEY ("voided_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "readings_pending_import_idx" ON "readings" USING btree ("pending_import_id") WHERE "readings"."pending_import_id" is not null;--> statement-breakpoint
CREATE UNIQUE INDEX "circuit_charges_visit_circuit_unique" ON "circuit_charges" USING btree ("visit_id","circuit") WHERE "circuit_charges"."voided_at" is null;--> statement-breakpoint
ALTER TABLE "adjustments" ADD CONSTRAINT "adjustments_void_complete" CHECK (("adjustments"."voided_at" is null) = ("adjustments"."void_reason" is null));--> statement-breakpoint
ALTER TABLE "circuit_charges" ADD CONSTRAINT "circuit_charges_void_complete" CHECK (("circuit_charges"."voided_at" is null) = ("circuit_charges"."void_reason" is null));--> statement-breakpoint
ALTER TABLE "electrical_checks" ADD CONSTRAINT "electrical_checks_void_complete" CHECK (("electrical_checks"."voided_at" is null) = ("electrical_checks"."void_reason" is null));--> statement-breakpoint
ALTER TABLE "evacuations" ADD CONSTRAINT "evacuations_void_complete" CHECK (("evacuations"."voided_at" is null) = ("evacuations"."void_reason" is null));--> statement-breakpoint
ALTER TABLE "leak_searches" ADD CONSTRAINT "leak_searches_void_complete" CHECK (("leak_searches"."voided_at" is null) = ("leak_searches"."void_reason" is null));--> statement-breakpoint
ALTER TABLE "pressure_tests" ADD CONSTRAINT "pressure_tests_void_complete" CHECK (("pressure_tests"."voided_at" is null) = ("pressure_tests"."void_reason" is null));--> statement-breakpoint
ALTER TABLE "readings" ADD CONSTRAINT "readings_void_complete" CHECK (("readings"."voided_at" is null) = ("readings"."void_reason" is null));--> statement-breakpoint
ALTER TABLE "refrigerant_movements" ADD CONSTRAINT "refrigerant_movements_void_complete" CHECK (("refrigerant_movements"."voided_at" is null) = ("refrigerant_movements"."void_reason" is null));