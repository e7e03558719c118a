ALTER TABLE "attachments" ADD COLUMN "taken_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "attachments" ADD COLUMN "client_key" text;--> statement-breakpoint
CREATE UNIQUE INDEX "attachments_client_key_idx" ON "attachments" USING btree ("uploaded_by","client_key");