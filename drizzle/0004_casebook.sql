CREATE TABLE "casebook_attempts" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	"case_id" text NOT NULL,
	"case_title" text NOT NULL,
	"refrigerant" text NOT NULL,
	"expected_state" text NOT NULL,
	"answers" jsonb NOT NULL,
	"score" jsonb NOT NULL,
	"correct_count" integer NOT NULL,
	"all_correct" boolean NOT NULL,
	"expected" jsonb NOT NULL,
	"reasoning" text,
	"worked" jsonb NOT NULL,
	"safety" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "casebook_cases" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"title" text NOT NULL,
	"difficulty" text NOT NULL,
	"story" jsonb NOT NULL,
	"input" jsonb NOT NULL,
	"expected" jsonb NOT NULL,
	"reasoning" text NOT NULL,
	"safety_topics" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"status" text DEFAULT 'draft' NOT NULL,
	"from_reading_id" uuid,
	"created_by" uuid,
	"published_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "casebook_attempts" ADD CONSTRAINT "casebook_attempts_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "casebook_attempts" ADD CONSTRAINT "casebook_attempts_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "casebook_cases" ADD CONSTRAINT "casebook_cases_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "casebook_cases" ADD CONSTRAINT "casebook_cases_from_reading_id_readings_id_fk" FOREIGN KEY ("from_reading_id") REFERENCES "public"."readings"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "casebook_cases" ADD CONSTRAINT "casebook_cases_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "casebook_attempts_user_idx" ON "casebook_attempts" USING btree ("organisation_id","user_id","created_at");--> statement-breakpoint
CREATE INDEX "casebook_attempts_case_idx" ON "casebook_attempts" USING btree ("organisation_id","case_id");--> statement-breakpoint
CREATE INDEX "casebook_cases_organisation_idx" ON "casebook_cases" USING btree ("organisation_id","status");