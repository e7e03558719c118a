import { bigint, boolean, index, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
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
    /** When the photo was taken, from the camera's own record, where the device sent it. */
    takenAt: timestamp("taken_at", { withTimezone: true }),
    /**
     * The device's key for one photo: a retry after a lost answer finds the first upload instead of
     * making a second. Unique per uploader.
     */
    clientKey: text("client_key"),
    voidedAt: timestamp("voided_at", { withTimezone: true }),
    voidedBy: uuid("voided_by").references(() => users.id),
    voidReason: text("void_reason"),
  },
  (t) => [index("attachments_project_idx").on(t.projectId, t.stage), uniqueIndex("attachments_client_key_idx").on(t.uploadedBy, t.clientKey)],
);
