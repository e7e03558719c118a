ALTER TABLE "company" ADD COLUMN "floor_code" text DEFAULT 'us-irc' NOT NULL;--> statement-breakpoint
ALTER TABLE "load_approvals" ADD COLUMN "floor_basis" jsonb;--> statement-breakpoint
ALTER TABLE "load_approvals" ADD COLUMN "stale_reason" text;--> statement-breakpoint
ALTER TABLE "load_approvals" ADD COLUMN "rules_version" integer DEFAULT 1 NOT NULL;--> statement-breakpoint
-- Data backfill added by hand (drizzle-kit can't express it): designs saved before the top edge was
-- asked read as an open top ("free"), and their approvals' snapshots get the same key so the
-- snapshot still equals the design; the re-screen (db/queries/load-rescreen.ts) then decides
-- whether each approval still stands under the new rules.
UPDATE "tank_designs" SET "data" = "data" || '{"topEdge":"free"}'::jsonb WHERE NOT ("data" ? 'topEdge');--> statement-breakpoint
UPDATE "load_approvals" SET "design_snapshot" = "design_snapshot" || '{"topEdge":"free"}'::jsonb WHERE NOT ("design_snapshot" ? 'topEdge');
