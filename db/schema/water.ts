import { doublePrecision, index, integer, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { projects } from "./projects";
import { users } from "./users";

/** Water-test readings in mg/L, °C and dKH. Nothing is deleted: a lead voids with a reason. */
export const waterTests = pgTable(
  "water_tests",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id),
    takenAt: timestamp("taken_at", { withTimezone: true }).notNull(),
    ammoniaMgL: doublePrecision("ammonia_mg_l"),
    nitriteMgL: doublePrecision("nitrite_mg_l"),
    nitrateMgL: doublePrecision("nitrate_mg_l"),
    pH: doublePrecision("ph"),
    tempC: doublePrecision("temp_c"),
    khDkh: doublePrecision("kh_dkh"),
    /** Salt water only: practical salinity (ppt, roughly g/kg). */
    salinityPpt: doublePrecision("salinity_ppt"),
    notes: text("notes"),
    takenBy: uuid("taken_by")
      .notNull()
      .references(() => users.id),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    /** When a lead corrects a reading, the new row points at the one it replaces. */
    correctsId: uuid("corrects_id"),
    voidedAt: timestamp("voided_at", { withTimezone: true }),
    voidedBy: uuid("voided_by").references(() => users.id),
    voidReason: text("void_reason"),
  },
  (t) => [index("water_tests_project_idx").on(t.projectId, t.takenAt)],
);

export const ammoniaDoses = pgTable(
  "ammonia_doses",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id),
    dosedAt: timestamp("dosed_at", { withTimezone: true }).notNull(),
    targetMgL: doublePrecision("target_mg_l").notNull(),
    amountMl: doublePrecision("amount_ml"),
    sourcePercent: doublePrecision("source_percent"),
    notes: text("notes"),
    byUserId: uuid("by_user_id")
      .notNull()
      .references(() => users.id),
    voidedAt: timestamp("voided_at", { withTimezone: true }),
    voidedBy: uuid("voided_by").references(() => users.id),
    voidReason: text("void_reason"),
  },
  (t) => [index("ammonia_doses_project_idx").on(t.projectId, t.dosedAt)],
);

/** Fish added to the tank, batch by batch. */
export const stockingBatches = pgTable(
  "stocking_batches",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id),
    addedAt: timestamp("added_at", { withTimezone: true }).notNull(),
    description: text("description").notNull(),
    fishCount: integer("fish_count").notNull(),
    quarantineDays: integer("quarantine_days"),
    byUserId: uuid("by_user_id")
      .notNull()
      .references(() => users.id),
    override: text("override_reason"),
  },
  (t) => [index("stocking_batches_project_idx").on(t.projectId, t.addedAt)],
);
