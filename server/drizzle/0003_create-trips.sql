CREATE TYPE "public"."trip_role" AS ENUM('leader', 'partner', 'viewer');--> statement-breakpoint
CREATE TABLE "trips" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"start_date" date NOT NULL,
	"nights" integer NOT NULL,
	"latitude_deg" double precision NOT NULL,
	"longitude_deg" double precision NOT NULL,
	"time_zone" text NOT NULL,
	"time_zone_derived" boolean DEFAULT false NOT NULL,
	"sky_preset_id" text,
	"reserve_share" double precision NOT NULL,
	"gram_limit_g" integer,
	"solar_input" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "trips_nights_range" CHECK ("trips"."nights" between 1 and 60),
	CONSTRAINT "trips_reserve_share_range" CHECK ("trips"."reserve_share" >= 0 and "trips"."reserve_share" < 1),
	CONSTRAINT "trips_gram_limit_positive" CHECK ("trips"."gram_limit_g" is null or "trips"."gram_limit_g" > 0)
);
--> statement-breakpoint
CREATE TABLE "trip_members" (
	"trip_id" uuid NOT NULL,
	"account_id" uuid NOT NULL,
	"role" "trip_role" NOT NULL,
	"gram_limit_g" integer,
	"joined_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "trip_members_pk" PRIMARY KEY("trip_id","account_id"),
	CONSTRAINT "trip_members_gram_limit_positive" CHECK ("trip_members"."gram_limit_g" is null or "trip_members"."gram_limit_g" > 0)
);
--> statement-breakpoint
CREATE TABLE "trip_devices" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"trip_id" uuid NOT NULL,
	"item_id" uuid NOT NULL,
	"use_profile_override" jsonb,
	"carrier_account_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "trip_members" ADD CONSTRAINT "trip_members_trip_id_trips_id_fk" FOREIGN KEY ("trip_id") REFERENCES "public"."trips"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "trip_members" ADD CONSTRAINT "trip_members_account_id_accounts_id_fk" FOREIGN KEY ("account_id") REFERENCES "public"."accounts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "trip_devices" ADD CONSTRAINT "trip_devices_trip_id_trips_id_fk" FOREIGN KEY ("trip_id") REFERENCES "public"."trips"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "trip_devices" ADD CONSTRAINT "trip_devices_item_id_locker_items_id_fk" FOREIGN KEY ("item_id") REFERENCES "public"."locker_items"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "trip_devices" ADD CONSTRAINT "trip_devices_carrier_account_id_accounts_id_fk" FOREIGN KEY ("carrier_account_id") REFERENCES "public"."accounts"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "trips_start_date_idx" ON "trips" USING btree ("start_date");--> statement-breakpoint
CREATE INDEX "trip_members_account_idx" ON "trip_members" USING btree ("account_id");--> statement-breakpoint
CREATE UNIQUE INDEX "trip_devices_trip_item_unique" ON "trip_devices" USING btree ("trip_id","item_id");--> statement-breakpoint
CREATE INDEX "trip_devices_item_idx" ON "trip_devices" USING btree ("item_id");