import { boolean, doublePrecision, index, integer, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { projects } from "./projects";
import { users } from "./users";
import { attachments } from "./attachments";
import { stockingBatches } from "./water";
import { DIETS, SWIM_LEVELS, TEMPERAMENTS, WATER_KINDS } from "../../lib/stocking/species";
import { EVENT_KINDS } from "../../lib/stocking/census";

/** The company's species catalogue (°C, mm). `source` says where each row's values came from. */
export const species = pgTable(
  "species",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    commonName: text("common_name").notNull(),
    scientificName: text("scientific_name").notNull(),
    water: text("water", { enum: WATER_KINDS }).notNull(),
    tempMinC: doublePrecision("temp_min_c").notNull(),
    tempMaxC: doublePrecision("temp_max_c").notNull(),
    phMin: doublePrecision("ph_min").notNull(),
    phMax: doublePrecision("ph_max").notNull(),
    adultLengthMm: integer("adult_length_mm").notNull(),
    temperament: text("temperament", { enum: TEMPERAMENTS }).notNull(),
    territorial: boolean("territorial").notNull().default(false),
    shoalMin: integer("shoal_min").notNull().default(1),
    level: text("level", { enum: SWIM_LEVELS }).notNull(),
    coralSafe: boolean("coral_safe"),
    invertSafe: boolean("invert_safe"),
    diet: text("diet", { enum: DIETS }).notNull(),
    minTankLengthMm: integer("min_tank_length_mm"),
    notes: text("notes"),
    /** "from memory", or the name of the handbook the values were taken from. */
    source: text("source").notNull(),
    updatedBy: uuid("updated_by").references(() => users.id),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
    retiredAt: timestamp("retired_at", { withTimezone: true }),
  },
  (t) => [uniqueIndex("species_scientific_idx").on(t.scientificName)],
);

/** The company's own tanks for quarantine and for fish taken out of a display. */
export const holdingTanks = pgTable("holding_tanks", {
  id: uuid("id").primaryKey().defaultRandom(),
  name: text("name").notNull(),
  volumeL: doublePrecision("volume_l").notNull(),
  location: text("location").notNull(),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  retiredAt: timestamp("retired_at", { withTimezone: true }),
});

/** The plan's settings for one project: whether it is a reef, and the pH the lead aims for. */
export const stockingPlans = pgTable("stocking_plans", {
  projectId: uuid("project_id")
    .primaryKey()
    .references(() => projects.id),
  reef: boolean("reef").notNull().default(false),
  targetPh: doublePrecision("target_ph"),
  notes: text("notes"),
  updatedBy: uuid("updated_by")
    .notNull()
    .references(() => users.id),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
});

/**
 * One batch of the plan, in the order it goes in. It is planned, then quarantined in a holding tank,
 * then added to the display (which records the stocking batch the cycling rules read).
 */
export const planBatches = pgTable(
  "plan_batches",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id),
    position: integer("position").notNull(),
    note: text("note"),
    holdingTankId: uuid("holding_tank_id").references(() => holdingTanks.id),
    quarantineStartedAt: timestamp("quarantine_started_at", { withTimezone: true }),
    /** The company's quarantine period when this batch went in, so a later change doesn't move its date. */
    quarantineDays: integer("quarantine_days"),
    overrideReason: text("override_reason"),
    overrideBy: uuid("override_by").references(() => users.id),
    overrideAt: timestamp("override_at", { withTimezone: true }),
    stockingBatchId: uuid("stocking_batch_id").references(() => stockingBatches.id),
    createdBy: uuid("created_by")
      .notNull()
      .references(() => users.id),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("plan_batches_position_idx").on(t.projectId, t.position)],
);

/** Species and counts in a batch. A change retires the old rows rather than deleting them. */
export const planBatchItems = pgTable(
  "plan_batch_items",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    batchId: uuid("batch_id")
      .notNull()
      .references(() => planBatches.id),
    speciesId: uuid("species_id")
      .notNull()
      .references(() => species.id),
    count: integer("count").notNull(),
    retiredAt: timestamp("retired_at", { withTimezone: true }),
  },
  (t) => [index("plan_batch_items_batch_idx").on(t.batchId)],
);

/** Daily observations and treatments during a batch's quarantine. */
export const quarantineNotes = pgTable(
  "quarantine_notes",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    batchId: uuid("batch_id")
      .notNull()
      .references(() => planBatches.id),
    kind: text("kind", { enum: ["observation", "treatment"] }).notNull(),
    at: timestamp("at", { withTimezone: true }).notNull(),
    text: text("text").notNull(),
    byUserId: uuid("by_user_id")
      .notNull()
      .references(() => users.id),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("quarantine_notes_batch_idx").on(t.batchId, t.at)],
);

/** Fish of one species that went into a tank together. Its count is the sum of its events. */
export const livestockGroups = pgTable(
  "livestock_groups",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id),
    speciesId: uuid("species_id")
      .notNull()
      .references(() => species.id),
    source: text("source").notNull(),
    addedAt: timestamp("added_at", { withTimezone: true }).notNull(),
    planBatchId: uuid("plan_batch_id").references(() => planBatches.id),
  },
  (t) => [index("livestock_groups_project_idx").on(t.projectId)],
);

/** Everything that happens to a group, in order; the census is rebuilt from these. */
export const livestockEvents = pgTable(
  "livestock_events",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id),
    groupId: uuid("group_id")
      .notNull()
      .references(() => livestockGroups.id),
    kind: text("kind", { enum: EVENT_KINDS }).notNull(),
    at: timestamp("at", { withTimezone: true }).notNull(),
    count: integer("count"),
    /** For lost and rehomed: whether the fish were in the display or a holding tank. */
    place: text("place", { enum: ["display", "holding"] }),
    cause: text("cause"),
    holdingTankId: uuid("holding_tank_id").references(() => holdingTanks.id),
    lengthMm: doublePrecision("length_mm"),
    note: text("note"),
    photoId: uuid("photo_id").references(() => attachments.id),
    byUserId: uuid("by_user_id")
      .notNull()
      .references(() => users.id),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("livestock_events_group_idx").on(t.groupId, t.at), index("livestock_events_project_idx").on(t.projectId, t.at)],
);
