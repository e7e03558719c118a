import { boolean, doublePrecision, index, integer, jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { stageEnum } from "./enums";
import { projects } from "./projects";
import { users } from "./users";
import { attachments } from "./attachments";

export type MeasureSpec = { unit: string; min: number; max: number };

/** Company-wide checklist items per stage, edited by the lead. Items are retired, never deleted. */
export const checklistItems = pgTable(
  "checklist_items",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    stage: stageEnum("stage").notNull(),
    label: text("label").notNull(),
    hint: text("hint"),
    position: text("position").notNull(),
    needsPhoto: boolean("needs_photo").notNull().default(false),
    measure: jsonb("measure").$type<MeasureSpec | null>(),
    retiredAt: timestamp("retired_at", { withTimezone: true }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("checklist_items_stage_idx").on(t.stage, t.position)],
);

/** Every tick and untick is a row; the newest row per (project, item) is the item's state. */
export const checklistTicks = pgTable(
  "checklist_ticks",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id),
    itemId: uuid("item_id")
      .notNull()
      .references(() => checklistItems.id),
    done: boolean("done").notNull(),
    note: text("note"),
    value: doublePrecision("value"),
    attachmentId: uuid("attachment_id").references(() => attachments.id),
    /** Sent by the device so a retried save is applied once. */
    clientKey: text("client_key"),
    byUserId: uuid("by_user_id")
      .notNull()
      .references(() => users.id),
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
    seq: integer("seq").generatedAlwaysAsIdentity(),
  },
  (t) => [
    index("checklist_ticks_project_idx").on(t.projectId, t.itemId),
    uniqueIndex("checklist_ticks_client_key_idx").on(t.clientKey),
  ],
);

/** The aquascape materials list the crew ticks as loaded into the van. */
export const materials = pgTable(
  "materials",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id),
    label: text("label").notNull(),
    quantity: doublePrecision("quantity").notNull(),
    unit: text("unit").notNull(),
    loadedAt: timestamp("loaded_at", { withTimezone: true }),
    loadedBy: uuid("loaded_by").references(() => users.id),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("materials_project_idx").on(t.projectId)],
);

/** Fill and leak-test records: the fill itself, the check at fill and the 24-hour check. */
export const leakChecks = pgTable(
  "leak_checks",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id),
    kind: text("kind", { enum: ["filled", "at fill", "after 24 hours"] }).notNull(),
    passed: boolean("passed").notNull(),
    note: text("note"),
    hoseFlowLPerMin: doublePrecision("hose_flow_l_per_min"),
    conditionerMl: doublePrecision("conditioner_ml"),
    byUserId: uuid("by_user_id")
      .notNull()
      .references(() => users.id),
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("leak_checks_project_idx").on(t.projectId, t.at)],
);
