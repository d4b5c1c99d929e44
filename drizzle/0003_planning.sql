CREATE TYPE "public"."payment_status" AS ENUM('open', 'paid');--> statement-breakpoint
CREATE TYPE "public"."quote_status" AS ENUM('sent', 'superseded', 'paid');--> statement-breakpoint
CREATE TABLE "payment_events" (
	"event_id" text PRIMARY KEY NOT NULL,
	"type" text NOT NULL,
	"checkout_session_id" text,
	"outcome" text NOT NULL,
	"received_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "payments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"quote_id" uuid NOT NULL,
	"studio_id" uuid NOT NULL,
	"checkout_session_id" text NOT NULL,
	"checkout_url" text,
	"amount_minor" integer NOT NULL,
	"currency" text NOT NULL,
	"status" "payment_status" DEFAULT 'open' NOT NULL,
	"provider_payment_id" text,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"paid_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "price_lists" (
	"studio_id" uuid PRIMARY KEY NOT NULL,
	"currency" text NOT NULL,
	"labour_rate_minor" integer DEFAULT 0 NOT NULL,
	"vat_pct" double precision DEFAULT 0 NOT NULL,
	"items" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"updated_by" uuid,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "quotes" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"layout_id" uuid NOT NULL,
	"studio_id" uuid NOT NULL,
	"client_id" uuid,
	"layout_version" integer NOT NULL,
	"status" "quote_status" DEFAULT 'sent' NOT NULL,
	"currency" text NOT NULL,
	"parts" jsonb NOT NULL,
	"gross_minor" integer NOT NULL,
	"deposit_pct" double precision NOT NULL,
	"deposit_minor" integer NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"sent_by" uuid,
	"sent_by_name" text NOT NULL,
	"sent_at" timestamp with time zone DEFAULT now() NOT NULL,
	"paid_at" timestamp with time zone,
	"receipt_sent_at" timestamp with time zone,
	"receipt_to" text
);
--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_quote_id_quotes_id_fk" FOREIGN KEY ("quote_id") REFERENCES "public"."quotes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "price_lists" ADD CONSTRAINT "price_lists_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "price_lists" ADD CONSTRAINT "price_lists_updated_by_users_id_fk" FOREIGN KEY ("updated_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quotes" ADD CONSTRAINT "quotes_layout_id_layouts_id_fk" FOREIGN KEY ("layout_id") REFERENCES "public"."layouts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quotes" ADD CONSTRAINT "quotes_studio_id_studios_id_fk" FOREIGN KEY ("studio_id") REFERENCES "public"."studios"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quotes" ADD CONSTRAINT "quotes_client_id_users_id_fk" FOREIGN KEY ("client_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quotes" ADD CONSTRAINT "quotes_sent_by_users_id_fk" FOREIGN KEY ("sent_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "payments_session" ON "payments" USING btree ("checkout_session_id");--> statement-breakpoint
CREATE INDEX "payments_quote" ON "payments" USING btree ("quote_id","created_at");--> statement-breakpoint
CREATE INDEX "quotes_layout" ON "quotes" USING btree ("layout_id","sent_at");--> statement-breakpoint
CREATE UNIQUE INDEX "quotes_one_open" ON "quotes" USING btree ("layout_id") WHERE "quotes"."status" = 'sent';--> statement-breakpoint
CREATE UNIQUE INDEX "quotes_one_paid" ON "quotes" USING btree ("layout_id") WHERE "quotes"."status" = 'paid';