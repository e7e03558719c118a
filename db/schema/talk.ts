import { boolean, index, integer, jsonb, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { projects } from "./projects";
import { users } from "./users";

/** The lead's notes on a project. Internal notes never reach a client. */
export const notes = pgTable(
  "notes",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id),
    body: text("body").notNull(),
    shared: boolean("shared").notNull().default(false),
    authorId: uuid("author_id")
      .notNull()
      .references(() => users.id),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("notes_project_idx").on(t.projectId, t.createdAt)],
);

/** Messages between a client and the project's people. */
export const messages = pgTable(
  "messages",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id),
    authorId: uuid("author_id")
      .notNull()
      .references(() => users.id),
    body: text("body").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("messages_project_idx").on(t.projectId, t.createdAt)],
);

/**
 * The outbox: every e-mail is written here in the same transaction as the change that causes it,
 * then sent by the queue's worker. `status` is what the lead sees.
 */
export const notices = pgTable(
  "notices",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    kind: text("kind").notNull(),
    projectId: uuid("project_id").references(() => projects.id),
    recipientId: uuid("recipient_id").references(() => users.id),
    toEmail: text("to_email").notNull(),
    subject: text("subject").notNull(),
    text: text("text").notNull(),
    html: text("html").notNull(),
    status: text("status", { enum: ["waiting", "sent", "failed", "withdrawn"] }).notNull().default("waiting"),
    /** The notice does not leave before this moment, so a change taken back at once reaches nobody. */
    sendAfter: timestamp("send_after", { withTimezone: true }).notNull().defaultNow(),
    /** What caused it, e.g. "note:<id>", so taking the change back can find the notice. */
    source: text("source"),
    /** Facts the outbox needs later, e.g. the stages of a stage change. */
    meta: jsonb("meta").$type<Record<string, unknown>>(),
    withdrawnAt: timestamp("withdrawn_at", { withTimezone: true }),
    attempts: integer("attempts").notNull().default(0),
    lastError: text("last_error"),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    sentAt: timestamp("sent_at", { withTimezone: true }),
  },
  (t) => [index("notices_status_idx").on(t.status, t.createdAt), index("notices_source_idx").on(t.source)],
);
