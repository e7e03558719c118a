import { integer, jsonb, pgTable, text, timestamp } from "drizzle-orm/pg-core";

/** One row: the installation company this deployment serves, and its company-wide rules. */
export const company = pgTable("company", {
  id: integer("id").primaryKey().default(1),
  name: text("name").notNull(),
  email: text("email").notNull(),
  phone: text("phone"),
  /** Partial cycle rules that override the defaults in lib/cycling. */
  cycleRules: jsonb("cycle_rules").$type<Record<string, unknown>>().notNull().default({}),
  /** The building code floors are screened against (lib/tank/floor-codes). */
  floorCode: text("floor_code").$type<"us-irc" | "en-uk">().notNull().default("us-irc"),
  /** Expected days per stage that override the defaults in lib/stages/durations. */
  stageDurations: jsonb("stage_durations").$type<Record<string, unknown>>().notNull().default({}),
  /** How long a client notice waits in the outbox before it leaves; null uses the deployment's default. */
  noticeDelaySeconds: integer("notice_delay_seconds"),
  /** Days a new batch of fish spends in a holding tank before the display. */
  quarantineDays: integer("quarantine_days").notNull().default(28),
  /** IANA time zone the company works in: service visits recur in it. */
  timeZone: text("time_zone").notNull().default("UTC"),
  /** Days between services per equipment kind that override lib/service/equipment-kinds. */
  equipmentIntervals: jsonb("equipment_intervals").$type<Record<string, number | null>>().notNull().default({}),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
});
