import { doublePrecision, index, pgTable, primaryKey, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { projects } from "./projects";
import { users } from "./users";
import type { Analyte } from "../../lib/cycling/readings";
import type { KitBasis } from "../../lib/cycling/test-kits";

/**
 * The test kits the company uses, described in its own words (see lib/cycling/test-kits). A kit no
 * longer used is retired, never deleted, so the projects that chose it keep their history.
 */
export const testKits = pgTable(
  "test_kits",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    name: text("name").notNull(),
    analyte: text("analyte").$type<Analyte>().notNull(),
    basis: text("basis").$type<KitBasis>().notNull(),
    /** The kit's steps in its own basis, ascending from 0. */
    steps: doublePrecision("steps").array().notNull(),
    createdBy: uuid("created_by").references(() => users.id),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    retiredAt: timestamp("retired_at", { withTimezone: true }),
  },
  (t) => [index("test_kits_analyte_idx").on(t.analyte)],
);

/** Which kit a project's team reads each analyte with; none chosen means the neutral steps. */
export const projectTestKits = pgTable(
  "project_test_kits",
  {
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id),
    analyte: text("analyte").$type<Analyte>().notNull(),
    kitId: uuid("kit_id")
      .notNull()
      .references(() => testKits.id),
    chosenBy: uuid("chosen_by").references(() => users.id),
    chosenAt: timestamp("chosen_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.projectId, t.analyte] })],
);
