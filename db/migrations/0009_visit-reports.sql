CREATE TABLE "service_task_template" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"label" text NOT NULL,
	"position" integer NOT NULL,
	"retired_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "visit_report_photos" (
	"visit_id" uuid NOT NULL,
	"attachment_id" uuid NOT NULL,
	"added_by" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "visit_report_photos_visit_id_attachment_id_pk" PRIMARY KEY("visit_id","attachment_id")
);
--> statement-breakpoint
CREATE TABLE "visit_reports" (
	"visit_id" uuid PRIMARY KEY NOT NULL,
	"project_id" uuid NOT NULL,
	"tasks" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"water_change_l" double precision,
	"water_test_id" uuid,
	"livestock_note" text,
	"client_notes" text,
	"internal_notes" text,
	"signed_off_by" uuid,
	"reopened_at" timestamp with time zone,
	"reopened_by" uuid,
	"reopen_reason" text,
	"client_notified_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "visit_task_ticks" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"visit_id" uuid NOT NULL,
	"task_index" integer NOT NULL,
	"done" boolean NOT NULL,
	"client_key" text NOT NULL,
	"by_user_id" uuid NOT NULL,
	"at" timestamp with time zone DEFAULT now() NOT NULL,
	"seq" integer GENERATED ALWAYS AS IDENTITY (sequence name "visit_task_ticks_seq_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1)
);
--> statement-breakpoint
ALTER TABLE "visit_report_photos" ADD CONSTRAINT "visit_report_photos_visit_id_visits_id_fk" FOREIGN KEY ("visit_id") REFERENCES "public"."visits"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "visit_report_photos" ADD CONSTRAINT "visit_report_photos_attachment_id_attachments_id_fk" FOREIGN KEY ("attachment_id") REFERENCES "public"."attachments"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "visit_report_photos" ADD CONSTRAINT "visit_report_photos_added_by_users_id_fk" FOREIGN KEY ("added_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "visit_reports" ADD CONSTRAINT "visit_reports_visit_id_visits_id_fk" FOREIGN KEY ("visit_id") REFERENCES "public"."visits"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "visit_reports" ADD CONSTRAINT "visit_reports_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "visit_reports" ADD CONSTRAINT "visit_reports_water_test_id_water_tests_id_fk" FOREIGN KEY ("water_test_id") REFERENCES "public"."water_tests"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "visit_reports" ADD CONSTRAINT "visit_reports_signed_off_by_users_id_fk" FOREIGN KEY ("signed_off_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "visit_reports" ADD CONSTRAINT "visit_reports_reopened_by_users_id_fk" FOREIGN KEY ("reopened_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "visit_task_ticks" ADD CONSTRAINT "visit_task_ticks_visit_id_visits_id_fk" FOREIGN KEY ("visit_id") REFERENCES "public"."visits"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "visit_task_ticks" ADD CONSTRAINT "visit_task_ticks_by_user_id_users_id_fk" FOREIGN KEY ("by_user_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "service_task_template_position_idx" ON "service_task_template" USING btree ("position");--> statement-breakpoint
CREATE INDEX "visit_reports_project_idx" ON "visit_reports" USING btree ("project_id");--> statement-breakpoint
CREATE INDEX "visit_task_ticks_visit_idx" ON "visit_task_ticks" USING btree ("visit_id","task_index");--> statement-breakpoint
CREATE UNIQUE INDEX "visit_task_ticks_client_key_idx" ON "visit_task_ticks" USING btree ("client_key");