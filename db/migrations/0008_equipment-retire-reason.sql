ALTER TABLE "equipment" ADD COLUMN "retired_by" uuid;--> statement-breakpoint
ALTER TABLE "equipment" ADD COLUMN "retire_reason" text;--> statement-breakpoint
ALTER TABLE "equipment" ADD COLUMN "updated_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "equipment" ADD CONSTRAINT "equipment_retired_by_users_id_fk" FOREIGN KEY ("retired_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;