ALTER TABLE "cabinet_models" ADD COLUMN "pass_through_amps" double precision;--> statement-breakpoint
ALTER TABLE "cabinet_models" ADD COLUMN "max_per_chain" integer;--> statement-breakpoint
ALTER TABLE "cabinet_models" ADD COLUMN "max_power_va" double precision;--> statement-breakpoint
ALTER TABLE "cabinet_models" ADD CONSTRAINT "cabinet_models_chain" CHECK (("cabinet_models"."pass_through_amps" is null or "cabinet_models"."pass_through_amps" > 0) and ("cabinet_models"."max_per_chain" is null or "cabinet_models"."max_per_chain" > 0));--> statement-breakpoint
ALTER TABLE "cabinet_models" ADD CONSTRAINT "cabinet_models_va" CHECK ("cabinet_models"."max_power_va" is null or "cabinet_models"."max_power_va" >= "cabinet_models"."max_power_w");