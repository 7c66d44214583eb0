CREATE INDEX "cabinets_serial_trgm_idx" ON "cabinets" USING gin ("serial" gin_trgm_ops);--> statement-breakpoint
CREATE INDEX "cabinets_batch_trgm_idx" ON "cabinets" USING gin ("batch" gin_trgm_ops);--> statement-breakpoint
CREATE INDEX "tickets_text_trgm_idx" ON "tickets" USING gin (("title" || ' ' || "description") gin_trgm_ops);