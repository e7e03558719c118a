import { bigint, boolean, index, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { stageEnum } from "./enums";
import { projects } from "./projects";
import { users } from "./users";

/** Files live in object storage under `key`; this row is the only way to reach them. */
export const attachments = pgTable(
  "attachments",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id),
    stage: stageEnum("stage").notNull(),
    key: text("key").notNull().unique(),
    thumbKey: text("thumb_key"),
    contentType: text("content_type").notNull(),
    sizeBytes: bigint("size_bytes", { mode: "number" }).notNull(),
    fileName: text("file_name").notNull(),
    caption: text("caption"),
    /** A client's photo of a problem at home. */
    isProblem: boolean("is_problem").notNull().default(false),
    status: text("status", { enum: ["pending", "ready"] }).notNull().default("pending"),
    uploadedBy: uuid("uploaded_by")
      .notNull()
      .references(() => users.id),
    uploadedAt: timestamp("uploaded_at", { withTimezone: true }).notNull().defaultNow(),
    voidedAt: timestamp("voided_at", { withTimezone: true }),
    voidedBy: uuid("voided_by").references(() => users.id),
    voidReason: text("void_reason"),
  },
  (t) => [index("attachments_project_idx").on(t.projectId, t.stage)],
);
