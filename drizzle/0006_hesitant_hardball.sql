ALTER TABLE "payments" DROP CONSTRAINT "payments_quote_id_quotes_id_fk";
--> statement-breakpoint
ALTER TABLE "layouts" ADD COLUMN "archived_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_quote_id_quotes_id_fk" FOREIGN KEY ("quote_id") REFERENCES "public"."quotes"("id") ON DELETE no action ON UPDATE no action;