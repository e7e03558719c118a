import { run, type Runner } from "graphile-worker";
import { env } from "../../env";
import { sendNotice } from "./send-notice";

/** Starts a queue worker. Any number may run, on any machine, against the same database. */
export async function startWorker(opts: { concurrency?: number; pollInterval?: number } = {}): Promise<Runner> {
  return run({
    connectionString: env().DATABASE_URL,
    concurrency: opts.concurrency ?? 2,
    pollInterval: opts.pollInterval ?? 1000,
    noHandleSignals: true,
    taskList: { send_notice: sendNotice },
  });
}
