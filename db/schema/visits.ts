import { date, index, integer, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { projects } from "./projects";
import { users } from "./users";

export const visitKinds = ["install day", "leak check", "water test", "first stocking", "water change", "filter service", "service visit"] as const;

/** Dated visits to a client's site: the install day and everything after it. */
export const visits = pgTable(
  "visits",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id),
    kind: text("kind", { enum: visitKinds }).notNull(),
    startsAt: timestamp("starts_at", { withTimezone: true }).notNull(),
    durationMinutes: integer("duration_minutes").notNull().default(120),
    notes: text("notes"),
    createdBy: uuid("created_by")
      .notNull()
      .references(() => users.id),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    cancelledAt: timestamp("cancelled_at", { withTimezone: true }),
    cancelledBy: uuid("cancelled_by").references(() => users.id),
    cancelReason: text("cancel_reason"),
    updatedAt: timestamp("updated_at", { withTimezone: true }),
    /** Who is to do it; null is unassigned. */
    assignedTo: uuid("assigned_to").references(() => users.id),
    /** Set when the visit's report is signed off. */
    completedAt: timestamp("completed_at", { withTimezone: true }),
    /** A visit a service plan produced, and the series date it stands for even after it is moved. */
    servicePlanId: uuid("service_plan_id"),
    occurrenceOn: date("occurrence_on"),
  },
  (t) => [
    index("visits_project_idx").on(t.projectId, t.startsAt),
    index("visits_starts_idx").on(t.startsAt),
    uniqueIndex("visits_plan_occurrence_idx").on(t.servicePlanId, t.occurrenceOn),
  ],
);
