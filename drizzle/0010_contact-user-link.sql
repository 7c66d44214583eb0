ALTER TABLE "contacts" ADD COLUMN "user_id" uuid;--> statement-breakpoint
ALTER TABLE "contacts" ADD CONSTRAINT "contacts_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "contacts_user_idx" ON "contacts" USING btree ("user_id");--> statement-breakpoint
ALTER TABLE "contacts" ADD CONSTRAINT "contacts_client_user_key" UNIQUE("client_id","user_id");