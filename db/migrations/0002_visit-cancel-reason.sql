ALTER TABLE "visits" ADD COLUMN "cancelled_by" uuid;--> statement-breakpoint
ALTER TABLE "visits" ADD COLUMN "cancel_reason" text;--> statement-breakpoint
ALTER TABLE "visits" ADD COLUMN "updated_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "visits" ADD CONSTRAINT "visits_cancelled_by_users_id_fk" FOREIGN KEY ("cancelled_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;