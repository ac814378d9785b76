CREATE TABLE "locker_item_files" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"item_id" uuid NOT NULL,
	"owner_id" uuid NOT NULL,
	"purpose" text NOT NULL,
	"content_type" text NOT NULL,
	"size_bytes" integer NOT NULL,
	"file_name" text NOT NULL,
	"object_key" text NOT NULL,
	"thumb_key" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "locker_item_files_purpose" CHECK ("locker_item_files"."purpose" in ('photo', 'spec-sheet')),
	CONSTRAINT "locker_item_files_size" CHECK ("locker_item_files"."size_bytes" >= 0)
);
--> statement-breakpoint
CREATE TABLE "catalogue_entries" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"kind" text NOT NULL,
	"name" text NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"spec" jsonb NOT NULL,
	"mass_g" integer DEFAULT 0 NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "locker_item_files" ADD CONSTRAINT "locker_item_files_item_id_locker_items_id_fk" FOREIGN KEY ("item_id") REFERENCES "public"."locker_items"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "locker_item_files" ADD CONSTRAINT "locker_item_files_owner_id_accounts_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."accounts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "catalogue_entries" ADD CONSTRAINT "catalogue_entries_created_by_accounts_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."accounts"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "locker_item_files_owner_item_idx" ON "locker_item_files" USING btree ("owner_id","item_id");--> statement-breakpoint
CREATE UNIQUE INDEX "catalogue_entries_name_unique" ON "catalogue_entries" USING btree (lower("name"));--> statement-breakpoint
CREATE INDEX "catalogue_entries_kind_name_idx" ON "catalogue_entries" USING btree ("kind","name");