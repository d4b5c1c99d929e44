ALTER TABLE "studios" ADD COLUMN "last_quote_number" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "quotes" ADD COLUMN "number" integer;--> statement-breakpoint
-- Quotes sent before references existed are numbered per studio in the order they were sent.
UPDATE "quotes" SET "number" = "numbered"."n" FROM (SELECT "id", row_number() OVER (PARTITION BY "studio_id" ORDER BY "sent_at", "id") AS "n" FROM "quotes") AS "numbered" WHERE "quotes"."id" = "numbered"."id";--> statement-breakpoint
UPDATE "studios" SET "last_quote_number" = "counted"."n" FROM (SELECT "studio_id", max("number") AS "n" FROM "quotes" GROUP BY "studio_id") AS "counted" WHERE "studios"."id" = "counted"."studio_id";--> statement-breakpoint
ALTER TABLE "quotes" ALTER COLUMN "number" SET NOT NULL;--> statement-breakpoint
CREATE UNIQUE INDEX "quotes_studio_number" ON "quotes" USING btree ("studio_id","number");
