CREATE TABLE "message_reads" (
	"user_id" uuid NOT NULL,
	"project_id" uuid NOT NULL,
	"read_at" timestamp with time zone NOT NULL,
	CONSTRAINT "message_reads_user_id_project_id_pk" PRIMARY KEY("user_id","project_id")
);
--> statement-breakpoint
ALTER TABLE "company" ADD COLUMN "stage_durations" jsonb DEFAULT '{}'::jsonb NOT NULL;--> statement-breakpoint
ALTER TABLE "company" ADD COLUMN "notice_delay_seconds" integer;--> statement-breakpoint
ALTER TABLE "projects" ADD COLUMN "cycle_started_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "stage_events" ADD COLUMN "cycle_restarted" boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE "attachments" ADD COLUMN "voided_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "attachments" ADD COLUMN "voided_by" uuid;--> statement-breakpoint
ALTER TABLE "attachments" ADD COLUMN "void_reason" text;--> statement-breakpoint
ALTER TABLE "notices" ADD COLUMN "send_after" timestamp with time zone DEFAULT now() NOT NULL;--> statement-breakpoint
ALTER TABLE "notices" ADD COLUMN "source" text;--> statement-breakpoint
ALTER TABLE "notices" ADD COLUMN "meta" jsonb;--> statement-breakpoint
ALTER TABLE "notices" ADD COLUMN "withdrawn_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "visits" ADD COLUMN "cancelled_by" uuid;--> statement-breakpoint
ALTER TABLE "visits" ADD COLUMN "cancel_reason" text;--> statement-breakpoint
ALTER TABLE "visits" ADD COLUMN "updated_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "message_reads" ADD CONSTRAINT "message_reads_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "message_reads" ADD CONSTRAINT "message_reads_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_voided_by_users_id_fk" FOREIGN KEY ("voided_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "visits" ADD CONSTRAINT "visits_cancelled_by_users_id_fk" FOREIGN KEY ("cancelled_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "notices_source_idx" ON "notices" USING btree ("source");