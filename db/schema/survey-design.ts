import { jsonb, pgTable, text, timestamp, uuid, boolean, index, integer } from "drizzle-orm/pg-core";
import { projects } from "./projects";
import { users } from "./users";
import { attachments } from "./attachments";

/** The site survey, validated by its zod schema at the boundary; stored whole as SI values. */
export const siteSurveys = pgTable("site_surveys", {
  projectId: uuid("project_id")
    .primaryKey()
    .references(() => projects.id),
  data: jsonb("data").$type<Record<string, unknown>>().notNull(),
  complete: boolean("complete").notNull().default(false),
  updatedBy: uuid("updated_by")
    .notNull()
    .references(() => users.id),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
});

/** The tank design (lib/tank's TankDesign, SI). */
export const tankDesigns = pgTable("tank_designs", {
  projectId: uuid("project_id")
    .primaryKey()
    .references(() => projects.id),
  data: jsonb("data").$type<Record<string, unknown>>().notNull(),
  updatedBy: uuid("updated_by")
    .notNull()
    .references(() => users.id),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
});

/**
 * The lead's sign-off of a load check. It holds the design it approved, so a later change to the
 * design makes the approval stale instead of silently carrying over.
 */
export const loadApprovals = pgTable(
  "load_approvals",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id),
    designSnapshot: jsonb("design_snapshot").$type<Record<string, unknown>>().notNull(),
    resultSnapshot: jsonb("result_snapshot").$type<Record<string, unknown>>().notNull(),
    engineerReference: text("engineer_reference"),
    engineerAttachmentId: uuid("engineer_attachment_id").references(() => attachments.id),
    approvedBy: uuid("approved_by")
      .notNull()
      .references(() => users.id),
    approvedAt: timestamp("approved_at", { withTimezone: true }).notNull().defaultNow(),
    revokedAt: timestamp("revoked_at", { withTimezone: true }),
    revokedBy: uuid("revoked_by").references(() => users.id),
    revokeReason: text("revoke_reason"),
    /** The floor inputs and building code the approval screened (lib/survey/floor-basis); null before they were kept. */
    floorBasis: jsonb("floor_basis").$type<Record<string, unknown>>(),
    /** Set when a later re-screen under changed rules gives a different verdict: why it no longer stands. */
    staleReason: text("stale_reason"),
    /** 1: approved under the first glass and floor rules; 2: by top edge and floor type. */
    rulesVersion: integer("rules_version").notNull().default(1),
  },
  (t) => [index("load_approvals_project_idx").on(t.projectId)],
);
