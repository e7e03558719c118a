/**
 * A local SMTP catcher for development and tests: accepts every message, keeps it in memory and
 * serves it as JSON over HTTP. Tests can also pause SMTP to see how the app copes with a mail outage.
 */
import http from "node:http";
import { SMTPServer } from "smtp-server";
import { simpleParser } from "mailparser";

export type CaughtMail = {
  id: number;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
  receivedAt: string;
};

export async function startMailCatcher({ smtpPort, httpPort }: { smtpPort: number; httpPort: number }) {
  const mails: CaughtMail[] = [];
  let nextId = 1;
  let smtp: SMTPServer | null = null;

  const makeSmtp = () =>
    new SMTPServer({
      authOptional: true,
      disabledCommands: ["STARTTLS"],
      logger: false,
      onData(stream, session, callback) {
        simpleParser(stream)
          .then((parsed) => {
            mails.push({
              id: nextId++,
              from: session.envelope.mailFrom ? session.envelope.mailFrom.address : "",
              to: session.envelope.rcptTo.map((r) => r.address),
              subject: parsed.subject ?? "",
              text: parsed.text ?? "",
              html: typeof parsed.html === "string" ? parsed.html : "",
              receivedAt: new Date().toISOString(),
            });
            callback();
          })
          .catch((error: Error) => callback(error));
      },
    });

  const listenSmtp = () =>
    new Promise<void>((resolve, reject) => {
      smtp = makeSmtp();
      smtp.on("error", reject);
      smtp.listen(smtpPort, "127.0.0.1", () => resolve());
    });
  const closeSmtp = () =>
    new Promise<void>((resolve) => {
      if (!smtp) return resolve();
      const s = smtp;
      smtp = null;
      s.close(() => resolve());
    });

  await listenSmtp();

  const api = http.createServer(async (req, res) => {
    const send = (status: number, body: unknown) => {
      res.writeHead(status, { "content-type": "application/json" });
      res.end(JSON.stringify(body));
    };
    const url = new URL(req.url ?? "/", "http://localhost");
    if (req.method === "GET" && url.pathname === "/api/messages") {
      const to = url.searchParams.get("to")?.toLowerCase();
      return send(200, to ? mails.filter((m) => m.to.some((a) => a.toLowerCase() === to)) : mails);
    }
    if (req.method === "DELETE" && url.pathname === "/api/messages") {
      mails.length = 0;
      return send(200, { ok: true });
    }
    if (req.method === "POST" && url.pathname === "/api/smtp/stop") {
      await closeSmtp();
      return send(200, { smtp: "stopped" });
    }
    if (req.method === "POST" && url.pathname === "/api/smtp/start") {
      if (!smtp) await listenSmtp();
      return send(200, { smtp: "running" });
    }
    if (req.method === "GET" && url.pathname === "/api/health") return send(200, { smtp: smtp ? "running" : "stopped" });
    send(404, { error: "Not found" });
  });
  await new Promise<void>((resolve) => api.listen(httpPort, "127.0.0.1", () => resolve()));

  return {
    mails,
    async close() {
      await closeSmtp();
      await new Promise<void>((resolve) => api.close(() => resolve()));
    },
  };
}
