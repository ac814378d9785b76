CREATE TYPE "public"."plan_status" AS ENUM('optimal', 'over-limit', 'best-so-far', 'nothing-feasible');--> statement-breakpoint
CREATE TYPE "public"."kit_source" AS ENUM('optimum', 'swap', 'hand');--> statement-breakpoint
CREATE TABLE "trip_plans" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"trip_id" uuid NOT NULL,
	"created_by" uuid,
	"input" jsonb NOT NULL,
	"result" jsonb NOT NULL,
	"model_version" text NOT NULL,
	"duration_ms" integer NOT NULL,
	"status" "plan_status" NOT NULL,
	"headline" text NOT NULL,
	"mass_g" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "trip_plans_duration_non_negative" CHECK ("trip_plans"."duration_ms" >= 0)
);
--> statement-breakpoint
CREATE TABLE "trip_kits" (
	"trip_id" uuid PRIMARY KEY NOT NULL,
	"source" "kit_source" NOT NULL,
	"plan_id" uuid,
	"lines" jsonb NOT NULL,
	"kit" jsonb NOT NULL,
	"evaluation" jsonb NOT NULL,
	"chosen_by" uuid,
	"chosen_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "trip_plans" ADD CONSTRAINT "trip_plans_trip_id_trips_id_fk" FOREIGN KEY ("trip_id") REFERENCES "public"."trips"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "trip_plans" ADD CONSTRAINT "trip_plans_created_by_accounts_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."accounts"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "trip_kits" ADD CONSTRAINT "trip_kits_trip_id_trips_id_fk" FOREIGN KEY ("trip_id") REFERENCES "public"."trips"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "trip_kits" ADD CONSTRAINT "trip_kits_plan_id_trip_plans_id_fk" FOREIGN KEY ("plan_id") REFERENCES "public"."trip_plans"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "trip_kits" ADD CONSTRAINT "trip_kits_chosen_by_accounts_id_fk" FOREIGN KEY ("chosen_by") REFERENCES "public"."accounts"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "trip_plans_trip_created_idx" ON "trip_plans" USING btree ("trip_id","created_at");