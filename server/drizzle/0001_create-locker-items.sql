CREATE TABLE "locker_items" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"owner_id" uuid NOT NULL,
	"kind" text NOT NULL,
	"name" text NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"count_owned" integer DEFAULT 1 NOT NULL,
	"spec" jsonb NOT NULL,
	"mass_g" integer DEFAULT 0 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "locker_items" ADD CONSTRAINT "locker_items_owner_id_accounts_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."accounts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "locker_items_owner_kind_idx" ON "locker_items" USING btree ("owner_id","kind");--> statement-breakpoint
CREATE INDEX "locker_items_owner_name_idx" ON "locker_items" USING btree ("owner_id","name");