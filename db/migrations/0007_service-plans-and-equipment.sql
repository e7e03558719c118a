CREATE TABLE "equipment" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid NOT NULL,
	"kind" text NOT NULL,
	"make_model" text,
	"installed_on" date,
	"warranty_until" date,
	"service_interval_days" integer,
	"last_serviced_at" timestamp with time zone,
	"notes" text,
	"created_by" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"retired_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "equipment_services" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"equipment_id" uuid NOT NULL,
	"visit_id" uuid,
	"serviced_at" timestamp with time zone NOT NULL,
	"note" text,
	"by_user_id" uuid NOT NULL,
	"client_key" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "service_plans" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid NOT NULL,
	"rule" text NOT NULL,
	"starts_on" date NOT NULL,
	"start_time" text DEFAULT '09:00' NOT NULL,
	"duration_minutes" integer DEFAULT 90 NOT NULL,
	"water_change_percent" double precision DEFAULT 20 NOT NULL,
	"tasks" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"usual_assignee_id" uuid,
	"created_by" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"ended_at" timestamp with time zone,
	"version" integer DEFAULT 1 NOT NULL
);
--> statement-breakpoint
ALTER TABLE "company" ADD COLUMN "time_zone" text DEFAULT 'UTC' NOT NULL;--> statement-breakpoint
ALTER TABLE "company" ADD COLUMN "equipment_intervals" jsonb DEFAULT '{}'::jsonb NOT NULL;--> statement-breakpoint
ALTER TABLE "water_tests" ADD COLUMN "salinity_ppt" double precision;--> statement-breakpoint
ALTER TABLE "visits" ADD COLUMN "assigned_to" uuid;--> statement-breakpoint
ALTER TABLE "visits" ADD COLUMN "completed_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "visits" ADD COLUMN "service_plan_id" uuid;--> statement-breakpoint
ALTER TABLE "visits" ADD COLUMN "occurrence_on" date;--> statement-breakpoint
ALTER TABLE "equipment" ADD CONSTRAINT "equipment_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "equipment" ADD CONSTRAINT "equipment_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "equipment_services" ADD CONSTRAINT "equipment_services_equipment_id_equipment_id_fk" FOREIGN KEY ("equipment_id") REFERENCES "public"."equipment"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "equipment_services" ADD CONSTRAINT "equipment_services_by_user_id_users_id_fk" FOREIGN KEY ("by_user_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "service_plans" ADD CONSTRAINT "service_plans_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "service_plans" ADD CONSTRAINT "service_plans_usual_assignee_id_users_id_fk" FOREIGN KEY ("usual_assignee_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "service_plans" ADD CONSTRAINT "service_plans_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "equipment_project_idx" ON "equipment" USING btree ("project_id");--> statement-breakpoint
CREATE INDEX "equipment_services_equipment_idx" ON "equipment_services" USING btree ("equipment_id","serviced_at");--> statement-breakpoint
CREATE UNIQUE INDEX "equipment_services_client_key_idx" ON "equipment_services" USING btree ("client_key");--> statement-breakpoint
CREATE INDEX "service_plans_project_idx" ON "service_plans" USING btree ("project_id");--> statement-breakpoint
ALTER TABLE "visits" ADD CONSTRAINT "visits_assigned_to_users_id_fk" FOREIGN KEY ("assigned_to") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "visits_starts_idx" ON "visits" USING btree ("starts_at");--> statement-breakpoint
CREATE UNIQUE INDEX "visits_plan_occurrence_idx" ON "visits" USING btree ("service_plan_id","occurrence_on");