import nodemailer, { type Transporter } from "nodemailer";
import { env } from "../env";

let transport: Transporter | null = null;

/** The SMTP transport: the local catcher in development and tests, the company's server in production. */
export function mailTransport(): Transporter {
  if (transport) return transport;
  const e = env();
  transport = nodemailer.createTransport({
    host: e.SMTP_HOST,
    port: e.SMTP_PORT,
    secure: e.SMTP_SECURE,
    ignoreTLS: !e.SMTP_SECURE && e.SMTP_HOST === "127.0.0.1",
    auth: e.SMTP_USER ? { user: e.SMTP_USER, pass: e.SMTP_PASS ?? "" } : undefined,
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
    socketTimeout: 10_000,
  });
  return transport;
}
