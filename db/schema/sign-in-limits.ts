import { bigint, integer, pgTable, varchar } from "drizzle-orm/pg-core";

/**
 * Counters for sign-in throttling, shared by every app instance. The shape is the one
 * rate-limiter-flexible's PostgreSQL store expects (it is told the table already exists).
 */
export const signInLimits = pgTable("sign_in_limits", {
  key: varchar("key", { length: 255 }).primaryKey(),
  points: integer("points").notNull().default(0),
  expire: bigint("expire", { mode: "number" }),
});
