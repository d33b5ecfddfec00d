CREATE TABLE "charge_references" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"equipment_id" uuid NOT NULL,
	"circuit" integer NOT NULL,
	"subcooling_k" double precision NOT NULL,
	"superheat_k" double precision NOT NULL,
	"evaporating_temp_c" double precision NOT NULL,
	"condensing_temp_c" double precision NOT NULL,
	"outdoor_air_dry_bulb_c" double precision,
	"return_air_dry_bulb_c" double precision,
	"source" text NOT NULL,
	"visit_id" uuid,
	"reading_id" uuid,
	"reading_count" integer DEFAULT 0 NOT NULL,
	"note" text,
	"set_by" uuid,
	"set_at" timestamp with time zone DEFAULT now() NOT NULL,
	"voided_at" timestamp with time zone,
	"voided_by" uuid,
	"void_reason" text,
	CONSTRAINT "charge_references_void_complete" CHECK (("charge_references"."voided_at" is null) = ("charge_references"."void_reason" is null)),
	CONSTRAINT "charge_references_source_known" CHECK (source in ('weigh-in', 'set-by-senior'))
);
--> statement-breakpoint
ALTER TABLE "visit_events" DROP CONSTRAINT "visit_events_action_known";--> statement-breakpoint
ALTER TABLE "charge_references" ADD CONSTRAINT "charge_references_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "charge_references" ADD CONSTRAINT "charge_references_equipment_id_equipment_id_fk" FOREIGN KEY ("equipment_id") REFERENCES "public"."equipment"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "charge_references" ADD CONSTRAINT "charge_references_visit_id_visits_id_fk" FOREIGN KEY ("visit_id") REFERENCES "public"."visits"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "charge_references" ADD CONSTRAINT "charge_references_reading_id_readings_id_fk" FOREIGN KEY ("reading_id") REFERENCES "public"."readings"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "charge_references" ADD CONSTRAINT "charge_references_set_by_users_id_fk" FOREIGN KEY ("set_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "charge_references" ADD CONSTRAINT "charge_references_voided_by_users_id_fk" FOREIGN KEY ("voided_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "charge_references_circuit_unique" ON "charge_references" USING btree ("equipment_id","circuit") WHERE "charge_references"."voided_at" is null;--> statement-breakpoint
CREATE INDEX "charge_references_equipment_idx" ON "charge_references" USING btree ("equipment_id","circuit","set_at");--> statement-breakpoint
ALTER TABLE "visit_events" ADD CONSTRAINT "visit_events_action_known" CHECK (action in ('started', 'submitted', 'signed-off', 'sent-back', 'reopened', 'voided', 'imported', 'charge-reference-set'));