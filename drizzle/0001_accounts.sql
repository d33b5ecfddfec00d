ALTER TABLE "users" ADD COLUMN "deactivated_at" timestamp with time zone;--> statement-breakpoint
CREATE INDEX "invitations_organisation_idx" ON "invitations" USING btree ("organisation_id");--> statement-breakpoint
CREATE INDEX "outbound_mail_organisation_idx" ON "outbound_mail" USING btree ("organisation_id","created_at");--> statement-breakpoint
CREATE INDEX "sessions_user_idx" ON "sessions" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "users_organisation_idx" ON "users" USING btree ("organisation_id");