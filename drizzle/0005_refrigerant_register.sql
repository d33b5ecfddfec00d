CREATE TABLE "circuit_charges" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"visit_id" uuid NOT NULL,
	"circuit" integer NOT NULL,
	"line_adjustment_kg" double precision DEFAULT 0 NOT NULL,
	"recorded_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "cylinders" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"label" text NOT NULL,
	"serial" text,
	"kind" text NOT NULL,
	"refrigerant" text NOT NULL,
	"water_capacity_kg" double precision NOT NULL,
	"tare_kg" double precision NOT NULL,
	"initial_contents_kg" double precision DEFAULT 0 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "refrigerant_movements" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"visit_id" uuid,
	"equipment_id" uuid,
	"circuit" integer,
	"refrigerant" text NOT NULL,
	"kind" text NOT NULL,
	"kg" double precision NOT NULL,
	"cylinder_id" uuid,
	"technician_id" uuid,
	"at" timestamp with time zone DEFAULT now() NOT NULL,
	"note" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "circuit_charges" ADD CONSTRAINT "circuit_charges_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "circuit_charges" ADD CONSTRAINT "circuit_charges_visit_id_visits_id_fk" FOREIGN KEY ("visit_id") REFERENCES "public"."visits"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "circuit_charges" ADD CONSTRAINT "circuit_charges_recorded_by_users_id_fk" FOREIGN KEY ("recorded_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cylinders" ADD CONSTRAINT "cylinders_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "refrigerant_movements" ADD CONSTRAINT "refrigerant_movements_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "refrigerant_movements" ADD CONSTRAINT "refrigerant_movements_visit_id_visits_id_fk" FOREIGN KEY ("visit_id") REFERENCES "public"."visits"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "refrigerant_movements" ADD CONSTRAINT "refrigerant_movements_equipment_id_equipment_id_fk" FOREIGN KEY ("equipment_id") REFERENCES "public"."equipment"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "refrigerant_movements" ADD CONSTRAINT "refrigerant_movements_cylinder_id_cylinders_id_fk" FOREIGN KEY ("cylinder_id") REFERENCES "public"."cylinders"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "refrigerant_movements" ADD CONSTRAINT "refrigerant_movements_technician_id_users_id_fk" FOREIGN KEY ("technician_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "circuit_charges_visit_circuit_unique" ON "circuit_charges" USING btree ("visit_id","circuit");--> statement-breakpoint
CREATE INDEX "cylinders_organisation_idx" ON "cylinders" USING btree ("organisation_id");--> statement-breakpoint
CREATE UNIQUE INDEX "cylinders_label_unique" ON "cylinders" USING btree ("organisation_id",lower("label"));--> statement-breakpoint
CREATE INDEX "refrigerant_movements_organisation_idx" ON "refrigerant_movements" USING btree ("organisation_id","at");--> statement-breakpoint
CREATE INDEX "refrigerant_movements_visit_idx" ON "refrigerant_movements" USING btree ("visit_id");--> statement-breakpoint
CREATE INDEX "refrigerant_movements_equipment_idx" ON "refrigerant_movements" USING btree ("equipment_id","at");--> statement-breakpoint
CREATE INDEX "refrigerant_movements_cylinder_idx" ON "refrigerant_movements" USING btree ("cylinder_id");