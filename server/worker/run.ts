import { run, type Runner } from "graphile-worker";
import { env } from "../../env";
import { sendNotice } from "./send-notice";
import { materialiseServiceVisits } from "./materialise-visits";

/** Starts a queue worker. Any number may run, on any machine, against the same database. */
export async function startWorker(opts: { concurrency?: number; pollInterval?: number } = {}): Promise<Runner> {
  return run({
    connectionString: env().DATABASE_URL,
    concurrency: opts.concurrency ?? 2,
    pollInterval: opts.pollInterval ?? 1000,
    noHandleSignals: true,
    taskList: { send_notice: sendNotice, materialise_service_visits: materialiseServiceVisits },
    // Hourly, at a quarter past: service plans write their coming visits ahead (graphile-worker's own cron, run once across workers).
    crontab: "15 * * * * materialise_service_visits",
  });
}
