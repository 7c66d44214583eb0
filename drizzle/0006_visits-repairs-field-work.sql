CREATE TABLE "idempotent_requests" (
	"user_id" uuid NOT NULL,
	"key" text NOT NULL,
	"route" text NOT NULL,
	"request_hash" text NOT NULL,
	"status_code" integer NOT NULL,
	"response" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "idempotent_requests_pk" PRIMARY KEY("user_id","key")
);
--> statement-breakpoint
ALTER TABLE "repairs" ADD COLUMN "replacement_cabinet_id" uuid;--> statement-breakpoint
ALTER TABLE "repairs" ADD COLUMN "batch_mismatch" boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE "visits" ADD COLUMN "sequence" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "visits" ADD COLUMN "cancel_reason" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "visits" ADD COLUMN "cancelled_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "visits" ADD COLUMN "signature_key" text;--> statement-breakpoint
ALTER TABLE "visits" ADD COLUMN "unsigned_reason" text;--> statement-breakpoint
ALTER TABLE "visits" ADD COLUMN "report_key" text;--> statement-breakpoint
ALTER TABLE "idempotent_requests" ADD CONSTRAINT "idempotent_requests_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "idempotent_requests_created_idx" ON "idempotent_requests" USING btree ("created_at");--> statement-breakpoint
ALTER TABLE "repairs" ADD CONSTRAINT "repairs_replacement_cabinet_id_cabinets_id_fk" FOREIGN KEY ("replacement_cabinet_id") REFERENCES "public"."cabinets"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "repairs_replacement_cabinet_idx" ON "repairs" USING btree ("replacement_cabinet_id");