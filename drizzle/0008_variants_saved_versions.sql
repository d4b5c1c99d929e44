CREATE TABLE "saved_versions" (
	"layout_id" uuid NOT NULL,
	"version" integer NOT NULL,
	"name" text NOT NULL,
	"doc" jsonb NOT NULL,
	"saved_by" uuid,
	"saved_at" timestamp with time zone DEFAULT now() NOT NULL,
	"restored_from" integer,
	CONSTRAINT "saved_versions_layout_id_version_pk" PRIMARY KEY("layout_id","version")
);
--> statement-breakpoint
ALTER TABLE "layouts" ADD COLUMN "variant_of" uuid;--> statement-breakpoint
ALTER TABLE "saved_versions" ADD CONSTRAINT "saved_versions_layout_id_layouts_id_fk" FOREIGN KEY ("layout_id") REFERENCES "public"."layouts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "saved_versions" ADD CONSTRAINT "saved_versions_saved_by_users_id_fk" FOREIGN KEY ("saved_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "layouts" ADD CONSTRAINT "layouts_variant_of_layouts_id_fk" FOREIGN KEY ("variant_of") REFERENCES "public"."layouts"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "layouts_variant_of" ON "layouts" USING btree ("variant_of");--> statement-breakpoint
-- Every layout starts its saved versions with the document it holds now.
INSERT INTO "saved_versions" ("layout_id", "version", "name", "doc", "saved_by", "saved_at") SELECT "id", "version", "name", "doc", "updated_by", "updated_at" FROM "layouts";
