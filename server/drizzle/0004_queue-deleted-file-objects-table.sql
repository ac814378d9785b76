CREATE TABLE "stored_object_deletions" (
	"id" bigint PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "stored_object_deletions_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 9223372036854775807 START WITH 1 CACHE 1),
	"object_key" text NOT NULL,
	"queued_at" timestamp with time zone DEFAULT now() NOT NULL
);
