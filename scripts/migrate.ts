/** Applies the database migrations (ours, then the job queue's). Safe to run on every start. */
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { runMigrations } from "graphile-worker";
import { closeDb, db } from "../db";
import { rescreenOldApprovals } from "../db/queries/load-rescreen";
import { env } from "../env";

await migrate(db(), { migrationsFolder: "db/migrations" });
await runMigrations({ connectionString: env().DATABASE_URL });
// Approvals recorded under the earlier glass and floor rules: keep those whose verdicts still hold.
const rescreen = await rescreenOldApprovals();
if (rescreen.checked) console.log(`load approvals re-screened: ${rescreen.checked}, no longer standing: ${rescreen.stale}`);
await closeDb();
console.log("migrations: up to date");
