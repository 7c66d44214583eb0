ALTER TABLE "stock_movements" ADD COLUMN "wall_id" uuid;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD COLUMN "batch_mismatch" boolean DEFAULT false NOT NULL;--> statement-breakpoint
CREATE INDEX "stock_movements_wall_idx" ON "stock_movements" USING btree ("wall_id");