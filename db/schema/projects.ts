import { date, index, integer, jsonb, pgTable, primaryKey, text, timestamp, uuid, boolean } from "drizzle-orm/pg-core";
import { stageEnum } from "./enums";
import { users } from "./users";

export const projects = pgTable(
  "projects",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    title: text("title").notNull(),
    clientId: uuid("client_id")
      .notNull()
      .references(() => users.id),
    leadId: uuid("lead_id").references(() => users.id),
    siteAddress: text("site_address").notNull(),
    siteTown: text("site_town").notNull(),
    stage: stageEnum("stage").notNull().default("site_survey"),
    /** Fractional index inside the stage's column (see fractional-indexing). */
    position: text("position").notNull(),
    /** Optimistic lock: bumped by every change a user makes to the card. */
    version: integer("version").notNull().default(1),
    stageEnteredAt: timestamp("stage_entered_at", { withTimezone: true }).notNull().defaultNow(),
    targetInstallDate: date("target_install_date"),
    targetHandoverDate: date("target_handover_date"),
    tankSummary: text("tank_summary"),
    /** When the current cycle began: kept when a card returns to cycling, reset only on purpose. */
    cycleStartedAt: timestamp("cycle_started_at", { withTimezone: true }),
    cycleReadyNotifiedAt: timestamp("cycle_ready_notified_at", { withTimezone: true }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("projects_stage_position_idx").on(t.stage, t.position), index("projects_client_idx").on(t.clientId)],
);

export const projectCrew = pgTable(
  "project_crew",
  {
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id),
  },
  (t) => [primaryKey({ columns: [t.projectId, t.userId] }), index("project_crew_user_idx").on(t.userId)],
);

/** The timeline: every stage change, with who, when and why. */
export const stageEvents = pgTable(
  "stage_events",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id),
    fromStage: stageEnum("from_stage"),
    toStage: stageEnum("to_stage").notNull(),
    byUserId: uuid("by_user_id")
      .notNull()
      .references(() => users.id),
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
    reason: text("reason"),
    /** True when the lead passed a closed gate; the gate's reasons are kept in gateReasons. */
    override: boolean("override").notNull().default(false),
    gateReasons: jsonb("gate_reasons").$type<string[]>(),
    /** True when the lead chose to start the cycle again on this move into cycling. */
    cycleRestarted: boolean("cycle_restarted").notNull().default(false),
  },
  (t) => [index("stage_events_project_idx").on(t.projectId, t.at)],
);
