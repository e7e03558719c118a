/** Starts the local stand-ins for hosted services: the mail catcher and the object store. */
import path from "node:path";
import { startMailCatcher } from "./fakes/mail-catcher";
import { startObjectStore } from "./fakes/object-store";

const num = (v: string | undefined, d: number) => (v ? Number(v) : d);
const smtpPort = num(process.env.FAKE_SMTP_PORT, 1025);
const httpPort = num(process.env.FAKE_MAIL_HTTP_PORT, 1080);
const s3Port = num(process.env.FAKE_S3_PORT, 4569);
const s3Dir = process.env.FAKE_S3_DIR ?? path.resolve(".data/s3");
const bucket = process.env.S3_BUCKET ?? "tankwright";

const mail = await startMailCatcher({ smtpPort, httpPort });
const store = await startObjectStore({ port: s3Port, directory: s3Dir, bucket });
console.log(`fakes: SMTP catcher on 127.0.0.1:${smtpPort} (mail at http://127.0.0.1:${httpPort}/api/messages), object store on 127.0.0.1:${s3Port}`);

const stop = async () => {
  await Promise.allSettled([mail.close(), store.close()]);
  process.exit(0);
};
process.on("SIGTERM", stop);
process.on("SIGINT", stop);
