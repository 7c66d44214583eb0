CREATE TYPE "public"."attachment_kind" AS ENUM('photo', 'video', 'document');--> statement-breakpoint
CREATE TYPE "public"."auth_token_kind" AS ENUM('invite', 'reset');--> statement-breakpoint
CREATE TYPE "public"."cabinet_event_kind" AS ENUM('placed', 'moved', 'swapped', 'removed', 'repaired', 'status_changed', 'imported');--> statement-breakpoint
CREATE TYPE "public"."cabinet_status" AS ENUM('installed', 'spare', 'at_bench', 'returned_to_vendor', 'retired');--> statement-breakpoint
CREATE TYPE "public"."clock_mode" AS ENUM('business', 'round_the_clock');--> statement-breakpoint
CREATE TYPE "public"."comment_visibility" AS ENUM('public', 'internal');--> statement-breakpoint
CREATE TYPE "public"."environment" AS ENUM('indoor', 'outdoor');--> statement-breakpoint
CREATE TYPE "public"."mail_status" AS ENUM('queued', 'sending', 'sent', 'failed');--> statement-breakpoint
CREATE TYPE "public"."mounting" AS ENUM('ground_stacked', 'flown', 'wall_fixed', 'curved');--> statement-breakpoint
CREATE TYPE "public"."part_kind" AS ENUM('module', 'power_supply', 'receiving_card', 'cable', 'fan', 'cabinet');--> statement-breakpoint
CREATE TYPE "public"."removed_part_fate" AS ENUM('none', 'to_bench', 'to_vendor_return', 'scrapped');--> statement-breakpoint
CREATE TYPE "public"."repair_action" AS ENUM('replaced', 'reseated', 'recalibrated', 'cabinet_swapped', 'cleaned');--> statement-breakpoint
CREATE TYPE "public"."repair_component" AS ENUM('module', 'power_supply', 'receiving_card', 'data_cable', 'power_cable', 'fan', 'whole_cabinet');--> statement-breakpoint
CREATE TYPE "public"."repair_fault" AS ENUM('dead_module', 'dead_pixels', 'colour_shift', 'flicker', 'no_signal', 'physical_damage', 'other');--> statement-breakpoint
CREATE TYPE "public"."role" AS ENUM('admin', 'coordinator', 'technician', 'client');--> statement-breakpoint
CREATE TYPE "public"."stock_location_kind" AS ENUM('warehouse', 'van', 'site_kit');--> statement-breakpoint
CREATE TYPE "public"."stock_movement_kind" AS ENUM('receipt', 'transfer', 'consumption', 'return_from_wall', 'sent_to_vendor', 'back_from_vendor', 'adjustment');--> statement-breakpoint
CREATE TYPE "public"."ticket_priority" AS ENUM('critical', 'high', 'normal', 'low');--> statement-breakpoint
CREATE TYPE "public"."ticket_scope" AS ENUM('cells', 'whole_wall', 'controller', 'site');--> statement-breakpoint
CREATE TYPE "public"."ticket_status" AS ENUM('new', 'acknowledged', 'scheduled', 'in_progress', 'waiting_parts', 'waiting_client', 'resolved', 'closed');--> statement-breakpoint
CREATE TYPE "public"."vendor_return_outcome" AS ENUM('pending', 'repaired', 'replaced', 'refused');--> statement-breakpoint
CREATE TYPE "public"."visit_kind" AS ENUM('ticket', 'maintenance');--> statement-breakpoint
CREATE TYPE "public"."visit_status" AS ENUM('planned', 'in_progress', 'completed', 'cancelled');--> statement-breakpoint
CREATE TABLE "audit_events" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"actor_id" uuid,
	"entity" text NOT NULL,
	"entity_id" text NOT NULL,
	"action" text NOT NULL,
	"before" jsonb,
	"after" jsonb,
	"request_id" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "auth_tokens" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"user_id" uuid NOT NULL,
	"kind" "auth_token_kind" NOT NULL,
	"token_hash" text NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"used_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "company_settings" (
	"id" integer PRIMARY KEY DEFAULT 1 NOT NULL,
	"name" text NOT NULL,
	"office_email" text NOT NULL,
	"phone" text DEFAULT '' NOT NULL,
	"address" text DEFAULT '' NOT NULL,
	"default_time_zone" text DEFAULT 'America/Chicago' NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "company_settings_single_row" CHECK ("company_settings"."id" = 1)
);
--> statement-breakpoint
CREATE TABLE "sessions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"user_id" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"revoked_at" timestamp with time zone,
	"ip" text DEFAULT '' NOT NULL,
	"user_agent" text DEFAULT '' NOT NULL
);
--> statement-breakpoint
CREATE TABLE "sign_in_attempts" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"email" text NOT NULL,
	"ip" text NOT NULL,
	"succeeded" boolean NOT NULL,
	"user_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "users" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"email" text NOT NULL,
	"name" text NOT NULL,
	"role" "role" NOT NULL,
	"client_id" uuid,
	"phone" text DEFAULT '' NOT NULL,
	"password_hash" text,
	"password_changed_at" timestamp with time zone,
	"disabled_at" timestamp with time zone,
	"last_sign_in_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "users_client_role" CHECK (("users"."role" = 'client') = ("users"."client_id" is not null)),
	CONSTRAINT "users_email_lower" CHECK ("users"."email" = lower("users"."email"))
);
--> statement-breakpoint
CREATE TABLE "clients" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"service_plan_id" uuid,
	"notes" text DEFAULT '' NOT NULL,
	"archived_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "clients_name_key" UNIQUE("name")
);
--> statement-breakpoint
CREATE TABLE "contacts" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"client_id" uuid NOT NULL,
	"site_id" uuid,
	"name" text NOT NULL,
	"title" text DEFAULT '' NOT NULL,
	"email" text,
	"phone" text DEFAULT '' NOT NULL,
	"receives_updates" boolean DEFAULT true NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "service_plans" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"clock_mode" "clock_mode" DEFAULT 'business' NOT NULL,
	"business_days" integer[] DEFAULT '{1,2,3,4,5}'::integer[] NOT NULL,
	"day_start" text DEFAULT '08:00' NOT NULL,
	"day_end" text DEFAULT '18:00' NOT NULL,
	"targets" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "service_plans_name_key" UNIQUE("name"),
	CONSTRAINT "service_plans_day_window" CHECK ("service_plans"."day_start" ~ '^[0-2][0-9]:[0-5][0-9]$' and "service_plans"."day_end" ~ '^[0-2][0-9]:[0-5][0-9]$' and "service_plans"."day_start" < "service_plans"."day_end")
);
--> statement-breakpoint
CREATE TABLE "sites" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"client_id" uuid NOT NULL,
	"name" text NOT NULL,
	"address" text DEFAULT '' NOT NULL,
	"city" text DEFAULT '' NOT NULL,
	"region" text DEFAULT '' NOT NULL,
	"postal_code" text DEFAULT '' NOT NULL,
	"country" text DEFAULT '' NOT NULL,
	"time_zone" text NOT NULL,
	"access_notes" text DEFAULT '' NOT NULL,
	"internal_notes" text DEFAULT '' NOT NULL,
	"archived_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "sites_client_name_key" UNIQUE("client_id","name"),
	CONSTRAINT "sites_id_client_key" UNIQUE("id","client_id")
);
--> statement-breakpoint
CREATE TABLE "attachments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"client_id" uuid,
	"wall_id" uuid,
	"ticket_id" uuid,
	"comment_id" uuid,
	"visit_id" uuid,
	"repair_id" uuid,
	"kind" "attachment_kind" NOT NULL,
	"storage_key" text NOT NULL,
	"file_name" text NOT NULL,
	"content_type" text NOT NULL,
	"size_bytes" bigint NOT NULL,
	"internal" boolean DEFAULT false NOT NULL,
	"uploaded_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "attachments_one_owner" CHECK (num_nonnulls("attachments"."wall_id", "attachments"."ticket_id", "attachments"."visit_id", "attachments"."repair_id") = 1),
	CONSTRAINT "attachments_size_positive" CHECK ("attachments"."size_bytes" > 0)
);
--> statement-breakpoint
CREATE TABLE "cabinet_events" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"cabinet_id" uuid NOT NULL,
	"kind" "cabinet_event_kind" NOT NULL,
	"from_wall_id" uuid,
	"from_column" integer,
	"from_row" integer,
	"to_wall_id" uuid,
	"to_column" integer,
	"to_row" integer,
	"other_cabinet_id" uuid,
	"repair_id" uuid,
	"from_status" "cabinet_status",
	"to_status" "cabinet_status",
	"note" text DEFAULT '' NOT NULL,
	"actor_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "cabinet_models" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"maker" text DEFAULT '' NOT NULL,
	"width_mm" double precision NOT NULL,
	"height_mm" double precision NOT NULL,
	"pixel_pitch_mm" double precision NOT NULL,
	"pixels_wide" integer NOT NULL,
	"pixels_high" integer NOT NULL,
	"modules_wide" integer NOT NULL,
	"modules_high" integer NOT NULL,
	"max_power_w" double precision NOT NULL,
	"typical_power_w" double precision NOT NULL,
	"weight_kg" double precision NOT NULL,
	"brightness_nits" integer NOT NULL,
	"voltage_min" integer DEFAULT 100 NOT NULL,
	"voltage_max" integer DEFAULT 240 NOT NULL,
	"environment" "environment" DEFAULT 'indoor' NOT NULL,
	"archived_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "cabinet_models_name_key" UNIQUE("name"),
	CONSTRAINT "cabinet_models_positive" CHECK ("cabinet_models"."width_mm" > 0 and "cabinet_models"."height_mm" > 0 and "cabinet_models"."pixel_pitch_mm" > 0 and "cabinet_models"."pixels_wide" > 0 and "cabinet_models"."pixels_high" > 0 and "cabinet_models"."modules_wide" > 0 and "cabinet_models"."modules_high" > 0 and "cabinet_models"."weight_kg" > 0),
	CONSTRAINT "cabinet_models_power" CHECK ("cabinet_models"."typical_power_w" > 0 and "cabinet_models"."typical_power_w" <= "cabinet_models"."max_power_w"),
	CONSTRAINT "cabinet_models_voltage" CHECK ("cabinet_models"."voltage_min" > 0 and "cabinet_models"."voltage_min" <= "cabinet_models"."voltage_max")
);
--> statement-breakpoint
CREATE TABLE "cabinets" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"serial" text NOT NULL,
	"cabinet_model_id" uuid NOT NULL,
	"wall_id" uuid,
	"column" integer,
	"row" integer,
	"batch" text DEFAULT '' NOT NULL,
	"status" "cabinet_status" DEFAULT 'installed' NOT NULL,
	"stock_location_id" uuid,
	"installed_on" date,
	"notes" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "cabinets_position_positive" CHECK (("cabinets"."column" is null or "cabinets"."column" >= 1) and ("cabinets"."row" is null or "cabinets"."row" >= 1)),
	CONSTRAINT "cabinets_position_with_wall" CHECK (("cabinets"."wall_id" is null) = ("cabinets"."column" is null) and ("cabinets"."wall_id" is null) = ("cabinets"."row" is null)),
	CONSTRAINT "cabinets_installed_on_wall" CHECK (("cabinets"."status" = 'installed') = ("cabinets"."wall_id" is not null))
);
--> statement-breakpoint
CREATE TABLE "controllers" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"wall_id" uuid,
	"model" text NOT NULL,
	"serial" text NOT NULL,
	"firmware" text DEFAULT '' NOT NULL,
	"outputs" integer NOT NULL,
	"outputs_in_use" integer DEFAULT 0 NOT NULL,
	"pixels_per_output" integer DEFAULT 650000 NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"archived_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "controllers_outputs" CHECK ("controllers"."outputs" > 0 and "controllers"."outputs_in_use" between 0 and "controllers"."outputs" and "controllers"."pixels_per_output" > 0)
);
--> statement-breakpoint
CREATE TABLE "maintenance_plans" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"wall_id" uuid NOT NULL,
	"interval_months" integer NOT NULL,
	"checklist" jsonb NOT NULL,
	"last_done_on" date,
	"next_due_on" date NOT NULL,
	"active" boolean DEFAULT true NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "maintenance_plans_interval" CHECK ("maintenance_plans"."interval_months" between 1 and 60)
);
--> statement-breakpoint
CREATE TABLE "walls" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"client_id" uuid NOT NULL,
	"site_id" uuid NOT NULL,
	"name" text NOT NULL,
	"cabinet_model_id" uuid NOT NULL,
	"columns" integer NOT NULL,
	"rows" integer NOT NULL,
	"mounting" "mounting" DEFAULT 'wall_fixed' NOT NULL,
	"install_date" date,
	"warranty_end" date,
	"calibration_date" date,
	"input_notes" text DEFAULT '' NOT NULL,
	"internal_notes" text DEFAULT '' NOT NULL,
	"plan_settings" jsonb,
	"data_runs" jsonb,
	"power_runs" jsonb,
	"archived_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "walls_site_name_key" UNIQUE("site_id","name"),
	CONSTRAINT "walls_id_client_key" UNIQUE("id","client_id"),
	CONSTRAINT "walls_grid_positive" CHECK ("walls"."columns" between 1 and 500 and "walls"."rows" between 1 and 500)
);
--> statement-breakpoint
CREATE TABLE "saved_views" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"user_id" uuid NOT NULL,
	"name" text NOT NULL,
	"filters" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "ticket_comments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"ticket_id" uuid NOT NULL,
	"author_id" uuid,
	"body" text NOT NULL,
	"visibility" "comment_visibility" NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "ticket_comments_body_present" CHECK (length(trim("ticket_comments"."body")) > 0)
);
--> statement-breakpoint
CREATE TABLE "tickets" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"number" serial NOT NULL,
	"client_id" uuid NOT NULL,
	"site_id" uuid NOT NULL,
	"wall_id" uuid,
	"scope" "ticket_scope" DEFAULT 'cells' NOT NULL,
	"cells" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"title" text NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"priority" "ticket_priority" NOT NULL,
	"status" "ticket_status" DEFAULT 'new' NOT NULL,
	"reporter_id" uuid,
	"assignee_id" uuid,
	"merged_into_id" uuid,
	"response_due_at" timestamp with time zone,
	"resolution_due_at" timestamp with time zone,
	"paused_at" timestamp with time zone,
	"paused_seconds" integer DEFAULT 0 NOT NULL,
	"acknowledged_at" timestamp with time zone,
	"resolved_at" timestamp with time zone,
	"closed_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "tickets_title_present" CHECK (length(trim("tickets"."title")) > 0),
	CONSTRAINT "tickets_paused_seconds" CHECK ("tickets"."paused_seconds" >= 0)
);
--> statement-breakpoint
CREATE TABLE "repairs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"client_id" uuid NOT NULL,
	"wall_id" uuid NOT NULL,
	"visit_id" uuid,
	"ticket_id" uuid,
	"cabinet_id" uuid,
	"column" integer NOT NULL,
	"row" integer NOT NULL,
	"component" "repair_component" NOT NULL,
	"module_column" integer,
	"module_row" integer,
	"fault" "repair_fault" NOT NULL,
	"action" "repair_action" NOT NULL,
	"part_id" uuid,
	"part_batch" text,
	"from_location_id" uuid,
	"removed_part_fate" "removed_part_fate" DEFAULT 'none' NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"technician_id" uuid,
	"performed_at" timestamp with time zone DEFAULT now() NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "repairs_position_positive" CHECK ("repairs"."column" >= 1 and "repairs"."row" >= 1),
	CONSTRAINT "repairs_module_position" CHECK (("repairs"."module_column" is null or "repairs"."module_column" >= 1) and ("repairs"."module_row" is null or "repairs"."module_row" >= 1)),
	CONSTRAINT "repairs_part_with_location" CHECK (("repairs"."part_id" is null) = ("repairs"."from_location_id" is null))
);
--> statement-breakpoint
CREATE TABLE "visit_technicians" (
	"visit_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	CONSTRAINT "visit_technicians_pk" PRIMARY KEY("visit_id","user_id")
);
--> statement-breakpoint
CREATE TABLE "visits" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"client_id" uuid NOT NULL,
	"site_id" uuid NOT NULL,
	"wall_id" uuid,
	"ticket_id" uuid,
	"maintenance_plan_id" uuid,
	"kind" "visit_kind" NOT NULL,
	"status" "visit_status" DEFAULT 'planned' NOT NULL,
	"window_start" timestamp with time zone NOT NULL,
	"window_end" timestamp with time zone NOT NULL,
	"checklist" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"summary" text DEFAULT '' NOT NULL,
	"internal_notes" text DEFAULT '' NOT NULL,
	"signed_by_name" text,
	"signed_at" timestamp with time zone,
	"report_sent_at" timestamp with time zone,
	"started_at" timestamp with time zone,
	"completed_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "visits_window_order" CHECK ("visits"."window_start" < "visits"."window_end")
);
--> statement-breakpoint
CREATE TABLE "parts" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"sku" text NOT NULL,
	"name" text NOT NULL,
	"kind" "part_kind" NOT NULL,
	"cabinet_model_id" uuid,
	"unit_cost" numeric(12, 2),
	"lead_time_days" integer DEFAULT 30 NOT NULL,
	"archived_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "reorder_points" (
	"part_id" uuid NOT NULL,
	"location_id" uuid NOT NULL,
	"min_quantity" integer NOT NULL,
	"reorder_quantity" integer NOT NULL,
	"alerted_at" timestamp with time zone,
	CONSTRAINT "reorder_points_pk" PRIMARY KEY("part_id","location_id"),
	CONSTRAINT "reorder_points_quantities" CHECK ("reorder_points"."min_quantity" >= 0 and "reorder_points"."reorder_quantity" > 0)
);
--> statement-breakpoint
CREATE TABLE "stock_balances" (
	"part_id" uuid NOT NULL,
	"batch" text DEFAULT '' NOT NULL,
	"location_id" uuid NOT NULL,
	"quantity" integer DEFAULT 0 NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "stock_balances_pk" PRIMARY KEY("part_id","batch","location_id"),
	CONSTRAINT "stock_balances_not_negative" CHECK ("stock_balances"."quantity" >= 0)
);
--> statement-breakpoint
CREATE TABLE "stock_locations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"kind" "stock_location_kind" NOT NULL,
	"holder_id" uuid,
	"site_id" uuid,
	"client_id" uuid,
	"archived_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "stock_locations_van_holder" CHECK ("stock_locations"."kind" <> 'van' or "stock_locations"."holder_id" is not null),
	CONSTRAINT "stock_locations_kit_site" CHECK (("stock_locations"."kind" = 'site_kit') = ("stock_locations"."site_id" is not null) and ("stock_locations"."site_id" is null) = ("stock_locations"."client_id" is null))
);
--> statement-breakpoint
CREATE TABLE "stock_movements" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"part_id" uuid NOT NULL,
	"batch" text DEFAULT '' NOT NULL,
	"kind" "stock_movement_kind" NOT NULL,
	"from_location_id" uuid,
	"to_location_id" uuid,
	"quantity" integer NOT NULL,
	"reason" text DEFAULT '' NOT NULL,
	"repair_id" uuid,
	"vendor_return_id" uuid,
	"actor_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "stock_movements_quantity_positive" CHECK ("stock_movements"."quantity" > 0),
	CONSTRAINT "stock_movements_has_location" CHECK ("stock_movements"."from_location_id" is not null or "stock_movements"."to_location_id" is not null),
	CONSTRAINT "stock_movements_distinct_locations" CHECK ("stock_movements"."from_location_id" is distinct from "stock_movements"."to_location_id"),
	CONSTRAINT "stock_movements_kind_locations" CHECK (case "stock_movements"."kind"
      when 'receipt' then "stock_movements"."from_location_id" is null and "stock_movements"."to_location_id" is not null
      when 'back_from_vendor' then "stock_movements"."from_location_id" is null and "stock_movements"."to_location_id" is not null
      when 'return_from_wall' then "stock_movements"."from_location_id" is null and "stock_movements"."to_location_id" is not null
      when 'consumption' then "stock_movements"."from_location_id" is not null and "stock_movements"."to_location_id" is null
      when 'sent_to_vendor' then "stock_movements"."from_location_id" is not null and "stock_movements"."to_location_id" is null
      when 'transfer' then "stock_movements"."from_location_id" is not null and "stock_movements"."to_location_id" is not null
      else true end)
);
--> statement-breakpoint
CREATE TABLE "vendor_returns" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"part_id" uuid NOT NULL,
	"serial" text DEFAULT '' NOT NULL,
	"batch" text DEFAULT '' NOT NULL,
	"quantity" integer DEFAULT 1 NOT NULL,
	"fault" text NOT NULL,
	"from_location_id" uuid,
	"repair_id" uuid,
	"rma_reference" text DEFAULT '' NOT NULL,
	"sent_on" date,
	"expected_back_on" date,
	"outcome" "vendor_return_outcome" DEFAULT 'pending' NOT NULL,
	"back_in_stock_on" date,
	"back_to_location_id" uuid,
	"notes" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "vendor_returns_quantity_positive" CHECK ("vendor_returns"."quantity" > 0)
);
--> statement-breakpoint
CREATE TABLE "outbound_mail" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"dedupe_key" text,
	"message_id" text NOT NULL,
	"to" text[] NOT NULL,
	"subject" text NOT NULL,
	"text" text NOT NULL,
	"html" text,
	"attachments" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"status" "mail_status" DEFAULT 'queued' NOT NULL,
	"attempts" integer DEFAULT 0 NOT NULL,
	"next_attempt_at" timestamp with time zone DEFAULT now() NOT NULL,
	"locked_until" timestamp with time zone,
	"last_error" text,
	"sent_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "audit_events" ADD CONSTRAINT "audit_events_actor_id_users_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "auth_tokens" ADD CONSTRAINT "auth_tokens_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sessions" ADD CONSTRAINT "sessions_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sign_in_attempts" ADD CONSTRAINT "sign_in_attempts_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "users" ADD CONSTRAINT "users_client_id_clients_id_fk" FOREIGN KEY ("client_id") REFERENCES "public"."clients"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "clients" ADD CONSTRAINT "clients_service_plan_id_service_plans_id_fk" FOREIGN KEY ("service_plan_id") REFERENCES "public"."service_plans"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "contacts" ADD CONSTRAINT "contacts_client_id_clients_id_fk" FOREIGN KEY ("client_id") REFERENCES "public"."clients"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "contacts" ADD CONSTRAINT "contacts_site_id_sites_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."sites"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sites" ADD CONSTRAINT "sites_client_id_clients_id_fk" FOREIGN KEY ("client_id") REFERENCES "public"."clients"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_client_id_clients_id_fk" FOREIGN KEY ("client_id") REFERENCES "public"."clients"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_wall_id_walls_id_fk" FOREIGN KEY ("wall_id") REFERENCES "public"."walls"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_ticket_id_tickets_id_fk" FOREIGN KEY ("ticket_id") REFERENCES "public"."tickets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_comment_id_ticket_comments_id_fk" FOREIGN KEY ("comment_id") REFERENCES "public"."ticket_comments"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_visit_id_visits_id_fk" FOREIGN KEY ("visit_id") REFERENCES "public"."visits"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_repair_id_repairs_id_fk" FOREIGN KEY ("repair_id") REFERENCES "public"."repairs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_uploaded_by_id_users_id_fk" FOREIGN KEY ("uploaded_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cabinet_events" ADD CONSTRAINT "cabinet_events_cabinet_id_cabinets_id_fk" FOREIGN KEY ("cabinet_id") REFERENCES "public"."cabinets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cabinet_events" ADD CONSTRAINT "cabinet_events_from_wall_id_walls_id_fk" FOREIGN KEY ("from_wall_id") REFERENCES "public"."walls"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cabinet_events" ADD CONSTRAINT "cabinet_events_to_wall_id_walls_id_fk" FOREIGN KEY ("to_wall_id") REFERENCES "public"."walls"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cabinet_events" ADD CONSTRAINT "cabinet_events_other_cabinet_id_cabinets_id_fk" FOREIGN KEY ("other_cabinet_id") REFERENCES "public"."cabinets"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cabinet_events" ADD CONSTRAINT "cabinet_events_actor_id_users_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cabinets" ADD CONSTRAINT "cabinets_cabinet_model_id_cabinet_models_id_fk" FOREIGN KEY ("cabinet_model_id") REFERENCES "public"."cabinet_models"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cabinets" ADD CONSTRAINT "cabinets_wall_id_walls_id_fk" FOREIGN KEY ("wall_id") REFERENCES "public"."walls"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cabinets" ADD CONSTRAINT "cabinets_stock_location_id_stock_locations_id_fk" FOREIGN KEY ("stock_location_id") REFERENCES "public"."stock_locations"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "controllers" ADD CONSTRAINT "controllers_wall_id_walls_id_fk" FOREIGN KEY ("wall_id") REFERENCES "public"."walls"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "maintenance_plans" ADD CONSTRAINT "maintenance_plans_wall_id_walls_id_fk" FOREIGN KEY ("wall_id") REFERENCES "public"."walls"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "walls" ADD CONSTRAINT "walls_cabinet_model_id_cabinet_models_id_fk" FOREIGN KEY ("cabinet_model_id") REFERENCES "public"."cabinet_models"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "walls" ADD CONSTRAINT "walls_site_client_fk" FOREIGN KEY ("site_id","client_id") REFERENCES "public"."sites"("id","client_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "walls" ADD CONSTRAINT "walls_client_fk" FOREIGN KEY ("client_id") REFERENCES "public"."clients"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "saved_views" ADD CONSTRAINT "saved_views_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "ticket_comments" ADD CONSTRAINT "ticket_comments_ticket_id_tickets_id_fk" FOREIGN KEY ("ticket_id") REFERENCES "public"."tickets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "ticket_comments" ADD CONSTRAINT "ticket_comments_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tickets" ADD CONSTRAINT "tickets_reporter_id_users_id_fk" FOREIGN KEY ("reporter_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tickets" ADD CONSTRAINT "tickets_assignee_id_users_id_fk" FOREIGN KEY ("assignee_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tickets" ADD CONSTRAINT "tickets_merged_into_id_tickets_id_fk" FOREIGN KEY ("merged_into_id") REFERENCES "public"."tickets"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tickets" ADD CONSTRAINT "tickets_site_client_fk" FOREIGN KEY ("site_id","client_id") REFERENCES "public"."sites"("id","client_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tickets" ADD CONSTRAINT "tickets_wall_client_fk" FOREIGN KEY ("wall_id","client_id") REFERENCES "public"."walls"("id","client_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tickets" ADD CONSTRAINT "tickets_client_fk" FOREIGN KEY ("client_id") REFERENCES "public"."clients"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "repairs" ADD CONSTRAINT "repairs_visit_id_visits_id_fk" FOREIGN KEY ("visit_id") REFERENCES "public"."visits"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "repairs" ADD CONSTRAINT "repairs_ticket_id_tickets_id_fk" FOREIGN KEY ("ticket_id") REFERENCES "public"."tickets"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "repairs" ADD CONSTRAINT "repairs_cabinet_id_cabinets_id_fk" FOREIGN KEY ("cabinet_id") REFERENCES "public"."cabinets"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "repairs" ADD CONSTRAINT "repairs_part_id_parts_id_fk" FOREIGN KEY ("part_id") REFERENCES "public"."parts"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "repairs" ADD CONSTRAINT "repairs_from_location_id_stock_locations_id_fk" FOREIGN KEY ("from_location_id") REFERENCES "public"."stock_locations"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "repairs" ADD CONSTRAINT "repairs_technician_id_users_id_fk" FOREIGN KEY ("technician_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "repairs" ADD CONSTRAINT "repairs_wall_client_fk" FOREIGN KEY ("wall_id","client_id") REFERENCES "public"."walls"("id","client_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "visit_technicians" ADD CONSTRAINT "visit_technicians_visit_id_visits_id_fk" FOREIGN KEY ("visit_id") REFERENCES "public"."visits"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "visit_technicians" ADD CONSTRAINT "visit_technicians_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "visits" ADD CONSTRAINT "visits_wall_id_walls_id_fk" FOREIGN KEY ("wall_id") REFERENCES "public"."walls"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "visits" ADD CONSTRAINT "visits_ticket_id_tickets_id_fk" FOREIGN KEY ("ticket_id") REFERENCES "public"."tickets"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "visits" ADD CONSTRAINT "visits_maintenance_plan_id_maintenance_plans_id_fk" FOREIGN KEY ("maintenance_plan_id") REFERENCES "public"."maintenance_plans"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "visits" ADD CONSTRAINT "visits_site_client_fk" FOREIGN KEY ("site_id","client_id") REFERENCES "public"."sites"("id","client_id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "visits" ADD CONSTRAINT "visits_client_fk" FOREIGN KEY ("client_id") REFERENCES "public"."clients"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "parts" ADD CONSTRAINT "parts_cabinet_model_id_cabinet_models_id_fk" FOREIGN KEY ("cabinet_model_id") REFERENCES "public"."cabinet_models"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reorder_points" ADD CONSTRAINT "reorder_points_part_id_parts_id_fk" FOREIGN KEY ("part_id") REFERENCES "public"."parts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reorder_points" ADD CONSTRAINT "reorder_points_location_id_stock_locations_id_fk" FOREIGN KEY ("location_id") REFERENCES "public"."stock_locations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_balances" ADD CONSTRAINT "stock_balances_part_id_parts_id_fk" FOREIGN KEY ("part_id") REFERENCES "public"."parts"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_balances" ADD CONSTRAINT "stock_balances_location_id_stock_locations_id_fk" FOREIGN KEY ("location_id") REFERENCES "public"."stock_locations"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_locations" ADD CONSTRAINT "stock_locations_holder_id_users_id_fk" FOREIGN KEY ("holder_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_locations" ADD CONSTRAINT "stock_locations_site_id_sites_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."sites"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_locations" ADD CONSTRAINT "stock_locations_client_id_clients_id_fk" FOREIGN KEY ("client_id") REFERENCES "public"."clients"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD CONSTRAINT "stock_movements_part_id_parts_id_fk" FOREIGN KEY ("part_id") REFERENCES "public"."parts"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD CONSTRAINT "stock_movements_from_location_id_stock_locations_id_fk" FOREIGN KEY ("from_location_id") REFERENCES "public"."stock_locations"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD CONSTRAINT "stock_movements_to_location_id_stock_locations_id_fk" FOREIGN KEY ("to_location_id") REFERENCES "public"."stock_locations"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD CONSTRAINT "stock_movements_actor_id_users_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "vendor_returns" ADD CONSTRAINT "vendor_returns_part_id_parts_id_fk" FOREIGN KEY ("part_id") REFERENCES "public"."parts"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "vendor_returns" ADD CONSTRAINT "vendor_returns_from_location_id_stock_locations_id_fk" FOREIGN KEY ("from_location_id") REFERENCES "public"."stock_locations"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "vendor_returns" ADD CONSTRAINT "vendor_returns_back_to_location_id_stock_locations_id_fk" FOREIGN KEY ("back_to_location_id") REFERENCES "public"."stock_locations"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "audit_events_entity_idx" ON "audit_events" USING btree ("entity","entity_id","created_at");--> statement-breakpoint
CREATE INDEX "audit_events_actor_idx" ON "audit_events" USING btree ("actor_id");--> statement-breakpoint
CREATE INDEX "audit_events_created_idx" ON "audit_events" USING btree ("created_at");--> statement-breakpoint
CREATE UNIQUE INDEX "auth_tokens_hash_key" ON "auth_tokens" USING btree ("token_hash");--> statement-breakpoint
CREATE INDEX "auth_tokens_user_idx" ON "auth_tokens" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "sessions_user_idx" ON "sessions" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "sign_in_attempts_email_idx" ON "sign_in_attempts" USING btree ("email","created_at");--> statement-breakpoint
CREATE INDEX "sign_in_attempts_ip_idx" ON "sign_in_attempts" USING btree ("ip","created_at");--> statement-breakpoint
CREATE UNIQUE INDEX "users_email_key" ON "users" USING btree ("email");--> statement-breakpoint
CREATE INDEX "users_client_idx" ON "users" USING btree ("client_id");--> statement-breakpoint
CREATE INDEX "clients_service_plan_idx" ON "clients" USING btree ("service_plan_id");--> statement-breakpoint
CREATE INDEX "contacts_client_idx" ON "contacts" USING btree ("client_id");--> statement-breakpoint
CREATE INDEX "contacts_site_idx" ON "contacts" USING btree ("site_id");--> statement-breakpoint
CREATE INDEX "sites_client_idx" ON "sites" USING btree ("client_id");--> statement-breakpoint
CREATE UNIQUE INDEX "attachments_storage_key" ON "attachments" USING btree ("storage_key");--> statement-breakpoint
CREATE INDEX "attachments_client_idx" ON "attachments" USING btree ("client_id");--> statement-breakpoint
CREATE INDEX "attachments_wall_idx" ON "attachments" USING btree ("wall_id");--> statement-breakpoint
CREATE INDEX "attachments_ticket_idx" ON "attachments" USING btree ("ticket_id");--> statement-breakpoint
CREATE INDEX "attachments_comment_idx" ON "attachments" USING btree ("comment_id");--> statement-breakpoint
CREATE INDEX "attachments_visit_idx" ON "attachments" USING btree ("visit_id");--> statement-breakpoint
CREATE INDEX "attachments_repair_idx" ON "attachments" USING btree ("repair_id");--> statement-breakpoint
CREATE INDEX "attachments_uploaded_by_idx" ON "attachments" USING btree ("uploaded_by_id");--> statement-breakpoint
CREATE INDEX "cabinet_events_cabinet_idx" ON "cabinet_events" USING btree ("cabinet_id","created_at");--> statement-breakpoint
CREATE INDEX "cabinet_events_to_wall_idx" ON "cabinet_events" USING btree ("to_wall_id");--> statement-breakpoint
CREATE INDEX "cabinet_events_from_wall_idx" ON "cabinet_events" USING btree ("from_wall_id");--> statement-breakpoint
CREATE INDEX "cabinet_events_other_idx" ON "cabinet_events" USING btree ("other_cabinet_id");--> statement-breakpoint
CREATE INDEX "cabinet_events_actor_idx" ON "cabinet_events" USING btree ("actor_id");--> statement-breakpoint
CREATE INDEX "cabinet_events_repair_idx" ON "cabinet_events" USING btree ("repair_id");--> statement-breakpoint
CREATE UNIQUE INDEX "cabinets_serial_key" ON "cabinets" USING btree ("serial");--> statement-breakpoint
CREATE UNIQUE INDEX "cabinets_wall_position_key" ON "cabinets" USING btree ("wall_id","column","row");--> statement-breakpoint
CREATE INDEX "cabinets_stock_location_idx" ON "cabinets" USING btree ("stock_location_id");--> statement-breakpoint
CREATE INDEX "cabinets_model_idx" ON "cabinets" USING btree ("cabinet_model_id");--> statement-breakpoint
CREATE UNIQUE INDEX "controllers_serial_key" ON "controllers" USING btree ("serial");--> statement-breakpoint
CREATE INDEX "controllers_wall_idx" ON "controllers" USING btree ("wall_id");--> statement-breakpoint
CREATE UNIQUE INDEX "maintenance_plans_wall_key" ON "maintenance_plans" USING btree ("wall_id");--> statement-breakpoint
CREATE INDEX "walls_client_idx" ON "walls" USING btree ("client_id");--> statement-breakpoint
CREATE INDEX "walls_site_idx" ON "walls" USING btree ("site_id");--> statement-breakpoint
CREATE INDEX "walls_cabinet_model_idx" ON "walls" USING btree ("cabinet_model_id");--> statement-breakpoint
CREATE UNIQUE INDEX "saved_views_user_name_key" ON "saved_views" USING btree ("user_id","name");--> statement-breakpoint
CREATE INDEX "ticket_comments_ticket_idx" ON "ticket_comments" USING btree ("ticket_id","created_at");--> statement-breakpoint
CREATE INDEX "ticket_comments_author_idx" ON "ticket_comments" USING btree ("author_id");--> statement-breakpoint
CREATE UNIQUE INDEX "tickets_number_key" ON "tickets" USING btree ("number");--> statement-breakpoint
CREATE INDEX "tickets_client_idx" ON "tickets" USING btree ("client_id","created_at");--> statement-breakpoint
CREATE INDEX "tickets_site_idx" ON "tickets" USING btree ("site_id");--> statement-breakpoint
CREATE INDEX "tickets_wall_idx" ON "tickets" USING btree ("wall_id");--> statement-breakpoint
CREATE INDEX "tickets_status_idx" ON "tickets" USING btree ("status","created_at");--> statement-breakpoint
CREATE INDEX "tickets_assignee_idx" ON "tickets" USING btree ("assignee_id");--> statement-breakpoint
CREATE INDEX "tickets_reporter_idx" ON "tickets" USING btree ("reporter_id");--> statement-breakpoint
CREATE INDEX "tickets_merged_into_idx" ON "tickets" USING btree ("merged_into_id");--> statement-breakpoint
CREATE INDEX "repairs_client_idx" ON "repairs" USING btree ("client_id");--> statement-breakpoint
CREATE INDEX "repairs_wall_idx" ON "repairs" USING btree ("wall_id","performed_at");--> statement-breakpoint
CREATE INDEX "repairs_visit_idx" ON "repairs" USING btree ("visit_id");--> statement-breakpoint
CREATE INDEX "repairs_ticket_idx" ON "repairs" USING btree ("ticket_id");--> statement-breakpoint
CREATE INDEX "repairs_cabinet_idx" ON "repairs" USING btree ("cabinet_id");--> statement-breakpoint
CREATE INDEX "repairs_part_idx" ON "repairs" USING btree ("part_id");--> statement-breakpoint
CREATE INDEX "repairs_from_location_idx" ON "repairs" USING btree ("from_location_id");--> statement-breakpoint
CREATE INDEX "repairs_technician_idx" ON "repairs" USING btree ("technician_id");--> statement-breakpoint
CREATE INDEX "visit_technicians_user_idx" ON "visit_technicians" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "visits_client_idx" ON "visits" USING btree ("client_id");--> statement-breakpoint
CREATE INDEX "visits_site_idx" ON "visits" USING btree ("site_id");--> statement-breakpoint
CREATE INDEX "visits_wall_idx" ON "visits" USING btree ("wall_id");--> statement-breakpoint
CREATE INDEX "visits_ticket_idx" ON "visits" USING btree ("ticket_id");--> statement-breakpoint
CREATE INDEX "visits_maintenance_plan_idx" ON "visits" USING btree ("maintenance_plan_id");--> statement-breakpoint
CREATE INDEX "visits_window_idx" ON "visits" USING btree ("window_start");--> statement-breakpoint
CREATE UNIQUE INDEX "parts_sku_key" ON "parts" USING btree ("sku");--> statement-breakpoint
CREATE INDEX "parts_cabinet_model_idx" ON "parts" USING btree ("cabinet_model_id");--> statement-breakpoint
CREATE INDEX "reorder_points_location_idx" ON "reorder_points" USING btree ("location_id");--> statement-breakpoint
CREATE INDEX "stock_balances_location_idx" ON "stock_balances" USING btree ("location_id");--> statement-breakpoint
CREATE UNIQUE INDEX "stock_locations_name_key" ON "stock_locations" USING btree ("name");--> statement-breakpoint
CREATE INDEX "stock_locations_holder_idx" ON "stock_locations" USING btree ("holder_id");--> statement-breakpoint
CREATE INDEX "stock_locations_site_idx" ON "stock_locations" USING btree ("site_id");--> statement-breakpoint
CREATE INDEX "stock_locations_client_idx" ON "stock_locations" USING btree ("client_id");--> statement-breakpoint
CREATE INDEX "stock_movements_part_idx" ON "stock_movements" USING btree ("part_id","created_at");--> statement-breakpoint
CREATE INDEX "stock_movements_from_idx" ON "stock_movements" USING btree ("from_location_id");--> statement-breakpoint
CREATE INDEX "stock_movements_to_idx" ON "stock_movements" USING btree ("to_location_id");--> statement-breakpoint
CREATE INDEX "stock_movements_repair_idx" ON "stock_movements" USING btree ("repair_id");--> statement-breakpoint
CREATE INDEX "stock_movements_vendor_return_idx" ON "stock_movements" USING btree ("vendor_return_id");--> statement-breakpoint
CREATE INDEX "stock_movements_actor_idx" ON "stock_movements" USING btree ("actor_id");--> statement-breakpoint
CREATE INDEX "vendor_returns_part_idx" ON "vendor_returns" USING btree ("part_id");--> statement-breakpoint
CREATE INDEX "vendor_returns_from_location_idx" ON "vendor_returns" USING btree ("from_location_id");--> statement-breakpoint
CREATE INDEX "vendor_returns_back_location_idx" ON "vendor_returns" USING btree ("back_to_location_id");--> statement-breakpoint
CREATE INDEX "vendor_returns_repair_idx" ON "vendor_returns" USING btree ("repair_id");--> statement-breakpoint
CREATE INDEX "vendor_returns_outcome_idx" ON "vendor_returns" USING btree ("outcome");--> statement-breakpoint
CREATE UNIQUE INDEX "outbound_mail_dedupe_key" ON "outbound_mail" USING btree ("dedupe_key");--> statement-breakpoint
CREATE UNIQUE INDEX "outbound_mail_message_id_key" ON "outbound_mail" USING btree ("message_id");--> statement-breakpoint
CREATE INDEX "outbound_mail_due_idx" ON "outbound_mail" USING btree ("status","next_attempt_at");