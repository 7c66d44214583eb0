CREATE INDEX "cabinets_serial_prefix_idx" ON "cabinets" USING btree ("serial" text_pattern_ops);--> statement-breakpoint
CREATE INDEX "tickets_created_idx" ON "tickets" USING btree ("created_at","id");--> statement-breakpoint
CREATE INDEX "tickets_updated_idx" ON "tickets" USING btree ("updated_at","id");--> statement-breakpoint
CREATE INDEX "tickets_open_updated_idx" ON "tickets" USING btree ("updated_at","id") WHERE "tickets"."status" in ('new', 'acknowledged', 'scheduled', 'in_progress', 'waiting_parts', 'waiting_client');--> statement-breakpoint
CREATE INDEX "tickets_open_due_idx" ON "tickets" USING btree ("resolution_due_at","id") WHERE "tickets"."status" in ('new', 'acknowledged', 'scheduled', 'in_progress', 'waiting_parts', 'waiting_client');--> statement-breakpoint
CREATE INDEX "tickets_running_clock_idx" ON "tickets" USING btree ("created_at","id") WHERE "tickets"."resolved_at" is null and "tickets"."resolution_due_at" is not null;