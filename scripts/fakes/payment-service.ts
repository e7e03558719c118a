/**
 * A local stand-in for the card payment service, serving only what Tankwright calls through the
 * SDK: creating and reading a checkout session. It also serves a plain hosted "pay" page, and when
 * the page's button is pressed it marks the session paid and POSTs a webhook signed exactly as the
 * SDK's constructEvent expects (the SDK's own generateTestHeaderString makes the header).
 * Test helpers under /api let a test re-deliver an event or expire a session.
 */
import http from "node:http";
import { randomBytes } from "node:crypto";
import Stripe from "stripe";

type Session = {
  id: string;
  object: "checkout.session";
  mode: "payment";
  status: "open" | "complete" | "expired";
  payment_status: "unpaid" | "paid";
  amount_total: number;
  currency: string;
  client_reference_id: string | null;
  metadata: Record<string, string>;
  success_url: string;
  cancel_url: string;
  url: string;
  description: string;
  created: number;
};

type Delivered = { id: string; type: string; payload: string; deliveries: number[] };

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
const rid = (prefix: string) => `${prefix}_${randomBytes(12).toString("hex")}`;

export async function startPaymentService(opts: { port: number; webhookUrl: string; secretKey: string; webhookSecret: string }) {
  const sessions = new Map<string, Session>();
  const events = new Map<string, Delivered>();
  const signer = new Stripe(opts.secretKey);
  const base = `http://127.0.0.1:${opts.port}`;

  async function deliver(ev: Delivered): Promise<number> {
    const header = signer.webhooks.generateTestHeaderString({ payload: ev.payload, secret: opts.webhookSecret });
    let status = 0;
    try {
      const res = await fetch(opts.webhookUrl, { method: "POST", headers: { "content-type": "application/json", "stripe-signature": header }, body: ev.payload });
      status = res.status;
    } catch {
      status = 0;
    }
    ev.deliveries.push(status);
    return status;
  }

  async function emit(type: string, session: Session): Promise<Delivered> {
    const id = rid("evt");
    const payload = JSON.stringify({ id, object: "event", api_version: null, created: Math.floor(Date.now() / 1000), livemode: false, pending_webhooks: 1, request: null, type, data: { object: session } }, null, 2);
    const ev = { id, type, payload, deliveries: [] };
    events.set(id, ev);
    await deliver(ev);
    return ev;
  }

  function createSession(form: URLSearchParams): Session {
    let amount = 0;
    let currency = "";
    const names: string[] = [];
    for (let i = 0; form.has(`line_items[${i}][quantity]`); i++) {
      const unit = Number(form.get(`line_items[${i}][price_data][unit_amount]`));
      const qty = Number(form.get(`line_items[${i}][quantity]`));
      amount += unit * qty;
      currency = form.get(`line_items[${i}][price_data][currency]`) ?? currency;
      names.push(form.get(`line_items[${i}][price_data][product_data][name]`) ?? "");
    }
    const metadata: Record<string, string> = {};
    for (const [k, v] of form) {
      const m = /^metadata\[(.+)\]$/.exec(k);
      if (m) metadata[m[1]] = v;
    }
    const id = rid("cs_test");
    const s: Session = {
      id,
      object: "checkout.session",
      mode: "payment",
      status: "open",
      payment_status: "unpaid",
      amount_total: amount,
      currency,
      client_reference_id: form.get("client_reference_id"),
      metadata,
      success_url: form.get("success_url") ?? "",
      cancel_url: form.get("cancel_url") ?? "",
      url: `${base}/pay/${id}`,
      description: names.join("; "),
      created: Math.floor(Date.now() / 1000),
    };
    sessions.set(id, s);
    return s;
  }

  const readBody = (req: http.IncomingMessage) =>
    new Promise<string>((resolve) => {
      let b = "";
      req.on("data", (c) => (b += c));
      req.on("end", () => resolve(b));
    });

  const payPage = (s: Session) => `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Pay · local test payments</title>
<style>body{font-family:system-ui,sans-serif;background:#eef1f4;margin:0}main{max-width:420px;margin:48px auto;background:#fff;border-radius:12px;padding:24px}
button{background:#334155;color:#fff;border:0;border-radius:8px;padding:12px 16px;font-size:16px;width:100%}a{display:block;margin-top:12px;text-align:center}</style></head>
<body><main><p>Local test payment service: no real card is charged.</p><h1>${esc(s.description)}</h1>
<p data-testid="fake-pay-amount">${(s.amount_total / 100).toFixed(2)} ${esc(s.currency.toUpperCase())}</p>
${s.status === "open" ? `<form method="post" action="/pay/${esc(s.id)}"><button type="submit">Pay now</button></form><a href="${esc(s.cancel_url)}">Cancel and go back</a>` : `<p>This checkout is ${esc(s.status)}.</p>`}
</main></body></html>`;

  const server = http.createServer(async (req, res) => {
    const url = new URL(req.url ?? "/", base);
    const json = (status: number, body: unknown) => {
      res.writeHead(status, { "content-type": "application/json" });
      res.end(JSON.stringify(body));
    };
    const apiError = (status: number, message: string) => json(status, { error: { type: "invalid_request_error", message } });
    try {
      if (url.pathname.startsWith("/v1/")) {
        if (req.headers.authorization !== `Bearer ${opts.secretKey}`) return apiError(401, "Invalid API key provided.");
        if (req.method === "POST" && url.pathname === "/v1/checkout/sessions") {
          const s = createSession(new URLSearchParams(await readBody(req)));
          if (!(s.amount_total > 0) || !s.currency) return apiError(400, "A checkout needs line items with a positive amount and a currency.");
          return json(200, s);
        }
        const m = /^\/v1\/checkout\/sessions\/([^/]+)$/.exec(url.pathname);
        if (req.method === "GET" && m) {
          const s = sessions.get(m[1]);
          return s ? json(200, s) : apiError(404, `No such checkout.session: '${m[1]}'`);
        }
        return apiError(404, "Unrecognized request URL.");
      }
      const pay = /^\/pay\/([^/]+)$/.exec(url.pathname);
      if (pay) {
        const s = sessions.get(pay[1]);
        if (!s) {
          res.writeHead(404, { "content-type": "text/plain" });
          return res.end("No such checkout.");
        }
        if (req.method === "GET") {
          res.writeHead(200, { "content-type": "text/html; charset=utf-8" });
          return res.end(payPage(s));
        }
        if (req.method === "POST") {
          if (s.status === "open") {
            s.status = "complete";
            s.payment_status = "paid";
            await emit("checkout.session.completed", s);
          }
          res.writeHead(303, { location: s.success_url });
          return res.end();
        }
      }
      if (req.method === "GET" && url.pathname === "/api/health") return json(200, { ok: true });
      if (req.method === "GET" && url.pathname === "/api/events") return json(200, [...events.values()].map((e) => ({ id: e.id, type: e.type, deliveries: e.deliveries, payload: e.payload })));
      const redeliver = /^\/api\/events\/([^/]+)\/redeliver$/.exec(url.pathname);
      if (req.method === "POST" && redeliver) {
        const ev = events.get(redeliver[1]);
        return ev ? json(200, { status: await deliver(ev) }) : json(404, { error: "No such event" });
      }
      const expire = /^\/api\/sessions\/([^/]+)\/expire$/.exec(url.pathname);
      if (req.method === "POST" && expire) {
        const s = sessions.get(expire[1]);
        if (!s) return json(404, { error: "No such checkout" });
        // Sends the expiry even for a paid session, so tests can deliver events out of order.
        const ev = await emit("checkout.session.expired", { ...s, status: "expired" });
        return json(200, { eventId: ev.id, status: ev.deliveries.at(-1) });
      }
      json(404, { error: "Not found" });
    } catch (error) {
      json(500, { error: String(error) });
    }
  });
  await new Promise<void>((resolve) => server.listen(opts.port, "127.0.0.1", () => resolve()));
  return { close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}
