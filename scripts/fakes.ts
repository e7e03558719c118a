/** Starts the local stand-ins for hosted services: the mail catcher, the object store and the card payment service. */
import path from "node:path";
import { startMailCatcher } from "./fakes/mail-catcher";
import { startObjectStore } from "./fakes/object-store";
import { startPaymentService } from "./fakes/payment-service";

const num = (v: string | undefined, d: number) => (v ? Number(v) : d);
const smtpPort = num(process.env.FAKE_SMTP_PORT, 1025);
const httpPort = num(process.env.FAKE_MAIL_HTTP_PORT, 1080);
const s3Port = num(process.env.FAKE_S3_PORT, 4569);
const s3Dir = process.env.FAKE_S3_DIR ?? path.resolve(".data/s3");
const bucket = process.env.S3_BUCKET ?? "tankwright";
const payPort = num(process.env.FAKE_PAY_PORT, 4566);
const appUrl = process.env.APP_URL ?? "http://localhost:3000";
// The same local defaults as env.ts's paymentsConfig, so the app and the fake agree.
const secretKey = process.env.PAYMENTS_SECRET_KEY ?? "sk_test_tankwright_local_fake";
const webhookSecret = process.env.PAYMENTS_WEBHOOK_SECRET ?? "whsec_tankwright_local_fake";

const mail = await startMailCatcher({ smtpPort, httpPort });
const store = await startObjectStore({ port: s3Port, directory: s3Dir, bucket });
const pay = await startPaymentService({ port: payPort, webhookUrl: `${appUrl.replace(/\/$/, "")}/api/payments/webhook`, secretKey, webhookSecret });
console.log(
  `fakes: SMTP catcher on 127.0.0.1:${smtpPort} (mail at http://127.0.0.1:${httpPort}/api/messages), object store on 127.0.0.1:${s3Port}, payment service on 127.0.0.1:${payPort}`,
);

const stop = async () => {
  await Promise.allSettled([mail.close(), store.close(), pay.close()]);
  process.exit(0);
};
process.on("SIGTERM", stop);
process.on("SIGINT", stop);
