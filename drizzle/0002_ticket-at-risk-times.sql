ALTER TABLE "tickets" ADD COLUMN "response_at_risk_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "tickets" ADD COLUMN "resolution_at_risk_at" timestamp with time zone;--> statement-breakpoint
CREATE INDEX "tickets_resolution_due_idx" ON "tickets" USING btree ("resolution_due_at");