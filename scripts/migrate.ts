/** Applies the database migrations (ours, then the job queue's). Safe to run on every start. */
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { runMigrations } from "graphile-worker";
import { closeDb, db } from "../db";
import { env } from "../env";

await migrate(db(), { migrationsFolder: "db/migrations" });
await runMigrations({ connectionString: env().DATABASE_URL });
await closeDb();
console.log("migrations: up to date");
