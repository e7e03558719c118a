CREATE TABLE "holding_tanks" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"volume_l" double precision NOT NULL,
	"location" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"retired_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "livestock_events" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid NOT NULL,
	"group_id" uuid NOT NULL,
	"kind" text NOT NULL,
	"at" timestamp with time zone NOT NULL,
	"count" integer,
	"place" text,
	"cause" text,
	"holding_tank_id" uuid,
	"length_mm" double precision,
	"note" text,
	"photo_id" uuid,
	"by_user_id" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "livestock_groups" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid NOT NULL,
	"species_id" uuid NOT NULL,
	"source" text NOT NULL,
	"added_at" timestamp with time zone NOT NULL,
	"plan_batch_id" uuid
);
--> statement-breakpoint
CREATE TABLE "plan_batch_items" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"batch_id" uuid NOT NULL,
	"species_id" uuid NOT NULL,
	"count" integer NOT NULL,
	"retired_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "plan_batches" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid NOT NULL,
	"position" integer NOT NULL,
	"note" text,
	"holding_tank_id" uuid,
	"quarantine_started_at" timestamp with time zone,
	"quarantine_days" integer,
	"override_reason" text,
	"override_by" uuid,
	"override_at" timestamp with time zone,
	"stocking_batch_id" uuid,
	"created_by" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "quarantine_notes" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"batch_id" uuid NOT NULL,
	"kind" text NOT NULL,
	"at" timestamp with time zone NOT NULL,
	"text" text NOT NULL,
	"by_user_id" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "species" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"common_name" text NOT NULL,
	"scientific_name" text NOT NULL,
	"water" text NOT NULL,
	"temp_min_c" double precision NOT NULL,
	"temp_max_c" double precision NOT NULL,
	"ph_min" double precision NOT NULL,
	"ph_max" double precision NOT NULL,
	"adult_length_mm" integer NOT NULL,
	"temperament" text NOT NULL,
	"territorial" boolean DEFAULT false NOT NULL,
	"shoal_min" integer DEFAULT 1 NOT NULL,
	"level" text NOT NULL,
	"coral_safe" boolean,
	"invert_safe" boolean,
	"diet" text NOT NULL,
	"min_tank_length_mm" integer,
	"notes" text,
	"source" text NOT NULL,
	"updated_by" uuid,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"retired_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "stocking_plans" (
	"project_id" uuid PRIMARY KEY NOT NULL,
	"reef" boolean DEFAULT false NOT NULL,
	"target_ph" double precision,
	"notes" text,
	"updated_by" uuid NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "company" ADD COLUMN "quarantine_days" integer DEFAULT 28 NOT NULL;--> statement-breakpoint
ALTER TABLE "livestock_events" ADD CONSTRAINT "livestock_events_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "livestock_events" ADD CONSTRAINT "livestock_events_group_id_livestock_groups_id_fk" FOREIGN KEY ("group_id") REFERENCES "public"."livestock_groups"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "livestock_events" ADD CONSTRAINT "livestock_events_holding_tank_id_holding_tanks_id_fk" FOREIGN KEY ("holding_tank_id") REFERENCES "public"."holding_tanks"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "livestock_events" ADD CONSTRAINT "livestock_events_photo_id_attachments_id_fk" FOREIGN KEY ("photo_id") REFERENCES "public"."attachments"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "livestock_events" ADD CONSTRAINT "livestock_events_by_user_id_users_id_fk" FOREIGN KEY ("by_user_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "livestock_groups" ADD CONSTRAINT "livestock_groups_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "livestock_groups" ADD CONSTRAINT "livestock_groups_species_id_species_id_fk" FOREIGN KEY ("species_id") REFERENCES "public"."species"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "livestock_groups" ADD CONSTRAINT "livestock_groups_plan_batch_id_plan_batches_id_fk" FOREIGN KEY ("plan_batch_id") REFERENCES "public"."plan_batches"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_batch_items" ADD CONSTRAINT "plan_batch_items_batch_id_plan_batches_id_fk" FOREIGN KEY ("batch_id") REFERENCES "public"."plan_batches"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_batch_items" ADD CONSTRAINT "plan_batch_items_species_id_species_id_fk" FOREIGN KEY ("species_id") REFERENCES "public"."species"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_batches" ADD CONSTRAINT "plan_batches_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_batches" ADD CONSTRAINT "plan_batches_holding_tank_id_holding_tanks_id_fk" FOREIGN KEY ("holding_tank_id") REFERENCES "public"."holding_tanks"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_batches" ADD CONSTRAINT "plan_batches_override_by_users_id_fk" FOREIGN KEY ("override_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_batches" ADD CONSTRAINT "plan_batches_stocking_batch_id_stocking_batches_id_fk" FOREIGN KEY ("stocking_batch_id") REFERENCES "public"."stocking_batches"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_batches" ADD CONSTRAINT "plan_batches_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quarantine_notes" ADD CONSTRAINT "quarantine_notes_batch_id_plan_batches_id_fk" FOREIGN KEY ("batch_id") REFERENCES "public"."plan_batches"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quarantine_notes" ADD CONSTRAINT "quarantine_notes_by_user_id_users_id_fk" FOREIGN KEY ("by_user_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "species" ADD CONSTRAINT "species_updated_by_users_id_fk" FOREIGN KEY ("updated_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stocking_plans" ADD CONSTRAINT "stocking_plans_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stocking_plans" ADD CONSTRAINT "stocking_plans_updated_by_users_id_fk" FOREIGN KEY ("updated_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "livestock_events_group_idx" ON "livestock_events" USING btree ("group_id","at");--> statement-breakpoint
CREATE INDEX "livestock_events_project_idx" ON "livestock_events" USING btree ("project_id","at");--> statement-breakpoint
CREATE INDEX "livestock_groups_project_idx" ON "livestock_groups" USING btree ("project_id");--> statement-breakpoint
CREATE INDEX "plan_batch_items_batch_idx" ON "plan_batch_items" USING btree ("batch_id");--> statement-breakpoint
CREATE UNIQUE INDEX "plan_batches_position_idx" ON "plan_batches" USING btree ("project_id","position");--> statement-breakpoint
CREATE INDEX "quarantine_notes_batch_idx" ON "quarantine_notes" USING btree ("batch_id","at");--> statement-breakpoint
CREATE UNIQUE INDEX "species_scientific_idx" ON "species" USING btree ("scientific_name");