CREATE TABLE "standing_pressure_checks" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"visit_id" uuid NOT NULL,
	"circuit" integer,
	"input" jsonb NOT NULL,
	"result" jsonb NOT NULL,
	"recorded_by" uuid,
	"taken_at" timestamp with time zone DEFAULT now() NOT NULL,
	"voided_at" timestamp with time zone,
	"voided_by" uuid,
	"void_reason" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "standing_pressure_checks_void_complete" CHECK (("standing_pressure_checks"."voided_at" is null) = ("standing_pressure_checks"."void_reason" is null))
);
--> statement-breakpoint
ALTER TABLE "standing_pressure_checks" ADD CONSTRAINT "standing_pressure_checks_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "standing_pressure_checks" ADD CONSTRAINT "standing_pressure_checks_visit_id_visits_id_fk" FOREIGN KEY ("visit_id") REFERENCES "public"."visits"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "standing_pressure_checks" ADD CONSTRAINT "standing_pressure_checks_recorded_by_users_id_fk" FOREIGN KEY ("recorded_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "standing_pressure_checks" ADD CONSTRAINT "standing_pressure_checks_voided_by_users_id_fk" FOREIGN KEY ("voided_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "standing_pressure_checks_visit_idx" ON "standing_pressure_checks" USING btree ("visit_id","taken_at");