ALTER TABLE "sign_in_attempts" ADD COLUMN "purpose" text DEFAULT 'sign_in' NOT NULL;--> statement-breakpoint
ALTER TABLE "sign_in_attempts" ADD COLUMN "device_id" text;--> statement-breakpoint
ALTER TABLE "sign_in_attempts" ADD CONSTRAINT "sign_in_attempts_purpose" CHECK ("sign_in_attempts"."purpose" in ('sign_in', 'password_check', 'reset'));