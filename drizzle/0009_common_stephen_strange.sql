ALTER TABLE "studios" ADD COLUMN "quote_details" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "studios" ADD COLUMN "quote_terms" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "studios" ADD COLUMN "quote_valid_days" integer DEFAULT 30 NOT NULL;--> statement-breakpoint
ALTER TABLE "quotes" ADD COLUMN "revision_id" uuid;--> statement-breakpoint
ALTER TABLE "quotes" ADD COLUMN "revision_letter" text;--> statement-breakpoint
ALTER TABLE "quotes" ADD COLUMN "revision_approved" boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE "quotes" ADD COLUMN "valid_until" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "quotes" ADD COLUMN "terms" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "quotes" ADD COLUMN "workshop_details" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "quotes" ADD CONSTRAINT "quotes_revision_id_revisions_id_fk" FOREIGN KEY ("revision_id") REFERENCES "public"."revisions"("id") ON DELETE set null ON UPDATE no action;