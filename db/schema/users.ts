import { sql } from "drizzle-orm";
import { pgTable, text, timestamp, uniqueIndex, uuid, primaryKey, boolean, integer } from "drizzle-orm/pg-core";
import { roleEnum } from "./enums";

export const users = pgTable(
  "users",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    name: text("name").notNull(),
    email: text("email").notNull(),
    /** Null until the person accepts their invitation and sets a password. */
    passwordHash: text("password_hash"),
    role: roleEnum("role").notNull(),
    phone: text("phone"),
    unitSystem: text("unit_system", { enum: ["metric", "imperial"] }).notNull().default("metric"),
    /** Secret in the person's calendar-feed address; replaced to revoke a shared feed. */
    calendarToken: text("calendar_token").unique(),
    /**
     * Every session token carries the version it was issued under; raising it (sign-out) ends every
     * session the person has, on every app instance.
     */
    sessionVersion: integer("session_version").notNull().default(1),
    /** Set by the lead: the person can no longer sign in, and open sessions stop working. */
    deactivatedAt: timestamp("deactivated_at", { withTimezone: true }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("users_email_lower_idx").on(sql`lower(${t.email})`)],
);

export const invitations = pgTable("invitations", {
  id: uuid("id").primaryKey().defaultRandom(),
  userId: uuid("user_id")
    .notNull()
    .references(() => users.id),
  /** SHA-256 of the token in the link; the token itself is never stored. */
  tokenHash: text("token_hash").notNull().unique(),
  expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
  usedAt: timestamp("used_at", { withTimezone: true }),
  createdBy: uuid("created_by").references(() => users.id),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
});

export const noticeKinds = ["stage_change", "cycle_ready", "shared_note", "message", "visit_report"] as const;

export const notificationPrefs = pgTable(
  "notification_prefs",
  {
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id),
    kind: text("kind", { enum: noticeKinds }).notNull(),
    enabled: boolean("enabled").notNull(),
  },
  (t) => [primaryKey({ columns: [t.userId, t.kind] })],
);
