CREATE TABLE "trip_pool_items" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"trip_id" uuid NOT NULL,
	"account_id" uuid NOT NULL,
	"item_id" uuid NOT NULL,
	"count" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "trip_pool_items_count_positive" CHECK ("trip_pool_items"."count" > 0)
);
--> statement-breakpoint
ALTER TABLE "trip_pool_items" ADD CONSTRAINT "trip_pool_items_trip_id_trips_id_fk" FOREIGN KEY ("trip_id") REFERENCES "public"."trips"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "trip_pool_items" ADD CONSTRAINT "trip_pool_items_account_id_accounts_id_fk" FOREIGN KEY ("account_id") REFERENCES "public"."accounts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "trip_pool_items" ADD CONSTRAINT "trip_pool_items_item_id_locker_items_id_fk" FOREIGN KEY ("item_id") REFERENCES "public"."locker_items"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "trip_pool_items_trip_item_unique" ON "trip_pool_items" USING btree ("trip_id","item_id");--> statement-breakpoint
CREATE INDEX "trip_pool_items_trip_account_idx" ON "trip_pool_items" USING btree ("trip_id","account_id");--> statement-breakpoint
CREATE INDEX "trip_pool_items_item_idx" ON "trip_pool_items" USING btree ("item_id");