ALTER TABLE "adjustments" ADD COLUMN "client_id" uuid;--> statement-breakpoint
ALTER TABLE "electrical_checks" ADD COLUMN "client_id" uuid;--> statement-breakpoint
ALTER TABLE "evacuations" ADD COLUMN "client_id" uuid;--> statement-breakpoint
ALTER TABLE "leak_searches" ADD COLUMN "client_id" uuid;--> statement-breakpoint
ALTER TABLE "photos" ADD COLUMN "client_id" uuid;--> statement-breakpoint
ALTER TABLE "pressure_tests" ADD COLUMN "client_id" uuid;--> statement-breakpoint
ALTER TABLE "readings" ADD COLUMN "client_id" uuid;--> statement-breakpoint
ALTER TABLE "refrigerant_movements" ADD COLUMN "client_id" uuid;--> statement-breakpoint
ALTER TABLE "standing_pressure_checks" ADD COLUMN "client_id" uuid;--> statement-breakpoint
ALTER TABLE "visit_comments" ADD COLUMN "client_id" uuid;--> statement-breakpoint
CREATE UNIQUE INDEX "adjustments_client_id_unique" ON "adjustments" USING btree ("visit_id","client_id") WHERE "adjustments"."client_id" is not null;--> statement-breakpoint
CREATE UNIQUE INDEX "electrical_checks_client_id_unique" ON "electrical_checks" USING btree ("visit_id","client_id") WHERE "electrical_checks"."client_id" is not null;--> statement-breakpoint
CREATE UNIQUE INDEX "evacuations_client_id_unique" ON "evacuations" USING btree ("visit_id","client_id") WHERE "evacuations"."client_id" is not null;--> statement-breakpoint
CREATE UNIQUE INDEX "leak_searches_client_id_unique" ON "leak_searches" USING btree ("visit_id","client_id") WHERE "leak_searches"."client_id" is not null;--> statement-breakpoint
CREATE UNIQUE INDEX "photos_client_id_unique" ON "photos" USING btree ("visit_id","client_id") WHERE "photos"."client_id" is not null;--> statement-breakpoint
CREATE UNIQUE INDEX "pressure_tests_client_id_unique" ON "pressure_tests" USING btree ("visit_id","client_id") WHERE "pressure_tests"."client_id" is not null;--> statement-breakpoint
CREATE UNIQUE INDEX "readings_client_id_unique" ON "readings" USING btree ("visit_id","client_id") WHERE "readings"."client_id" is not null;--> statement-breakpoint
CREATE UNIQUE INDEX "refrigerant_movements_client_id_unique" ON "refrigerant_movements" USING btree ("visit_id","client_id") WHERE "refrigerant_movements"."client_id" is not null;--> statement-breakpoint
CREATE UNIQUE INDEX "standing_pressure_checks_client_id_unique" ON "standing_pressure_checks" USING btree ("visit_id","client_id") WHERE "standing_pressure_checks"."client_id" is not null;--> statement-breakpoint
CREATE UNIQUE INDEX "visit_comments_client_id_unique" ON "visit_comments" USING btree ("visit_id","client_id") WHERE "visit_comments"."client_id" is not null;