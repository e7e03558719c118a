CREATE TABLE "project_test_kits" (
	"project_id" uuid NOT NULL,
	"analyte" text NOT NULL,
	"kit_id" uuid NOT NULL,
	"chosen_by" uuid,
	"chosen_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "project_test_kits_project_id_analyte_pk" PRIMARY KEY("project_id","analyte")
);
--> statement-breakpoint
CREATE TABLE "test_kits" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"analyte" text NOT NULL,
	"basis" text NOT NULL,
	"steps" double precision[] NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"retired_at" timestamp with time zone
);
--> statement-breakpoint
ALTER TABLE "project_test_kits" ADD CONSTRAINT "project_test_kits_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "project_test_kits" ADD CONSTRAINT "project_test_kits_kit_id_test_kits_id_fk" FOREIGN KEY ("kit_id") REFERENCES "public"."test_kits"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "project_test_kits" ADD CONSTRAINT "project_test_kits_chosen_by_users_id_fk" FOREIGN KEY ("chosen_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "test_kits" ADD CONSTRAINT "test_kits_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "test_kits_analyte_idx" ON "test_kits" USING btree ("analyte");