import { date, doublePrecision, index, integer, jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { EQUIPMENT_KINDS } from "../../lib/service/equipment-kinds";
import { projects } from "./projects";
import { users } from "./users";

/**
 * How a tank in service is looked after: one live plan per tank. The recurrence is an
 * RFC 5545 RRULE read in the company's time zone; each occurrence becomes a row in
 * `visits` keyed by (plan, occurrence date), so moving or skipping one keeps the series.
 */
export const servicePlans = pgTable(
  "service_plans",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id),
    /** RRULE body without DTSTART, e.g. FREQ=WEEKLY;INTERVAL=2;BYDAY=TU. */
    rule: text("rule").notNull(),
    startsOn: date("starts_on").notNull(),
    /** Local wall-clock time of the visit, HH:MM in the company's time zone. */
    startTime: text("start_time").notNull().default("09:00"),
    durationMinutes: integer("duration_minutes").notNull().default(90),
    /** Share of the tank's net volume changed at a routine visit, 0–100. */
    waterChangePercent: doublePrecision("water_change_percent").notNull().default(20),
    /** Labels of a routine visit's tasks, copied from the company template and edited per plan. */
    tasks: jsonb("tasks").$type<string[]>().notNull().default([]),
    usualAssigneeId: uuid("usual_assignee_id").references(() => users.id),
    createdBy: uuid("created_by")
      .notNull()
      .references(() => users.id),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
    endedAt: timestamp("ended_at", { withTimezone: true }),
    version: integer("version").notNull().default(1),
  },
  (t) => [index("service_plans_project_idx").on(t.projectId)],
);

/** Equipment on a tank. Pieces are retired, never deleted, so old visit reports still read. */
export const equipment = pgTable(
  "equipment",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id),
    kind: text("kind", { enum: EQUIPMENT_KINDS }).notNull(),
    /** Make and model as the crew reads them off the label. */
    makeModel: text("make_model"),
    installedOn: date("installed_on"),
    warrantyUntil: date("warranty_until"),
    /** Own interval; null falls back to the company's default for the kind. */
    serviceIntervalDays: integer("service_interval_days"),
    lastServicedAt: timestamp("last_serviced_at", { withTimezone: true }),
    notes: text("notes"),
    createdBy: uuid("created_by")
      .notNull()
      .references(() => users.id),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    retiredAt: timestamp("retired_at", { withTimezone: true }),
  },
  (t) => [index("equipment_project_idx").on(t.projectId)],
);

/** Each service of a piece of equipment; the newest sets `equipment.last_serviced_at`. */
export const equipmentServices = pgTable(
  "equipment_services",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    equipmentId: uuid("equipment_id")
      .notNull()
      .references(() => equipment.id),
    /** The visit it was done on, if any. */
    visitId: uuid("visit_id"),
    servicedAt: timestamp("serviced_at", { withTimezone: true }).notNull(),
    note: text("note"),
    byUserId: uuid("by_user_id")
      .notNull()
      .references(() => users.id),
    /** Sent by the device so a retried save is applied once. */
    clientKey: text("client_key"),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("equipment_services_equipment_idx").on(t.equipmentId, t.servicedAt), uniqueIndex("equipment_services_client_key_idx").on(t.clientKey)],
);
