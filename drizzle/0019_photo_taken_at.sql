ALTER TABLE "photos" ADD COLUMN "taken_at" timestamp with time zone DEFAULT now() NOT NULL;--> statement-breakpoint
-- Photos stored before the device sent its own time were taken when they reached the server.
UPDATE "photos" SET "taken_at" = "created_at";
