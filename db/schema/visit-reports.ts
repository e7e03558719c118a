import { boolean, doublePrecision, index, integer, jsonb, pgTable, primaryKey, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { projects } from "./projects";
import { users } from "./users";
import { visits } from "./visits";
import { waterTests } from "./water";
import { attachments } from "./attachments";

/** The company's routine-visit tasks, edited by the lead; a new plan copies them. Retired, never deleted. */
export const serviceTaskTemplate = pgTable(
  "service_task_template",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    label: text("label").notNull(),
    position: integer("position").notNull(),
    retiredAt: timestamp("retired_at", { withTimezone: true }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("service_task_template_position_idx").on(t.position)],
);

/**
 * What was done on one visit. The task list is copied from the plan when the report is opened, so a
 * later change to the plan never rewrites a past report. Signed off = `visits.completed_at`.
 */
export const visitReports = pgTable(
  "visit_reports",
  {
    visitId: uuid("visit_id")
      .primaryKey()
      .references(() => visits.id),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id),
    tasks: jsonb("tasks").$type<string[]>().notNull().default([]),
    /** Litres actually changed (the plan's share of the design's volume unless the crew changed it). */
    waterChangeL: doublePrecision("water_change_l"),
    waterTestId: uuid("water_test_id").references(() => waterTests.id),
    livestockNote: text("livestock_note"),
    clientNotes: text("client_notes"),
    /** Never shown to the client, in the portal or the e-mail. */
    internalNotes: text("internal_notes"),
    signedOffBy: uuid("signed_off_by").references(() => users.id),
    reopenedAt: timestamp("reopened_at", { withTimezone: true }),
    reopenedBy: uuid("reopened_by").references(() => users.id),
    reopenReason: text("reopen_reason"),
    /** Set when the client's e-mail was queued, so a second sign-off after a reopen does not send it again. */
    clientNotifiedAt: timestamp("client_notified_at", { withTimezone: true }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("visit_reports_project_idx").on(t.projectId)],
);

/** Every tick and untick of a visit's task is a row; the newest per (visit, task) is its state. */
export const visitTaskTicks = pgTable(
  "visit_task_ticks",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    visitId: uuid("visit_id")
      .notNull()
      .references(() => visits.id),
    taskIndex: integer("task_index").notNull(),
    done: boolean("done").notNull(),
    /** Sent by the device so a retried save is applied once. */
    clientKey: text("client_key").notNull(),
    byUserId: uuid("by_user_id")
      .notNull()
      .references(() => users.id),
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
    seq: integer("seq").generatedAlwaysAsIdentity(),
  },
  (t) => [index("visit_task_ticks_visit_idx").on(t.visitId, t.taskIndex), uniqueIndex("visit_task_ticks_client_key_idx").on(t.clientKey)],
);

/** Photos taken on a visit (uploaded through the project's usual upload flow). */
export const visitReportPhotos = pgTable(
  "visit_report_photos",
  {
    visitId: uuid("visit_id")
      .notNull()
      .references(() => visits.id),
    attachmentId: uuid("attachment_id")
      .notNull()
      .references(() => attachments.id),
    addedBy: uuid("added_by")
      .notNull()
      .references(() => users.id),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.visitId, t.attachmentId] })],
);
