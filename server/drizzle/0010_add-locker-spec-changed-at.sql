ALTER TABLE "locker_items" ADD COLUMN "spec_changed_at" timestamp with time zone DEFAULT now() NOT NULL;--> statement-breakpoint
-- Items stored before the column: their spec last changed no later than the item did.
UPDATE "locker_items" SET "spec_changed_at" = "updated_at";
