/** Runs a queue worker process (e-mail and other background work). */
import { startWorker } from "../server/worker/run";

const runner = await startWorker({ concurrency: 2 });
console.log("worker: running");
const stop = async () => {
  await runner.stop();
  process.exit(0);
};
process.on("SIGTERM", stop);
process.on("SIGINT", stop);
await runner.promise;
