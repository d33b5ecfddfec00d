ALTER TABLE "equipment" ADD COLUMN "application" text DEFAULT 'comfort-cooling' NOT NULL;--> statement-breakpoint
-- Existing units take the application their kind usually has (the equipment form shows and changes it).
UPDATE "equipment" SET "application" = 'medium-temperature-refrigeration' WHERE "kind" IN ('cool room', 'display case');--> statement-breakpoint
UPDATE "equipment" SET "application" = 'low-temperature-refrigeration' WHERE "kind" = 'freezer room';--> statement-breakpoint
UPDATE "equipment" SET "application" = 'process-chilling' WHERE "kind" = 'chiller';
