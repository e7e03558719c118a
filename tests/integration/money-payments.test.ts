import { describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { db } from "@/db";
import { cardCheckouts, notices, paymentEvents, payments, quoteAcceptances } from "@/db/schema";
import { makeTeam } from "../support/fixtures";
import { TEST_APP_URL, signedIn } from "../support/http";
import { fakeEvents, invoicesOf, issuedQuote, PAYMENTS_URL, payOnFake, postWebhook, sign } from "./money-support";

type Team = Awaited<ReturnType<typeof makeTeam>>;

/** A team whose client has accepted a quote of 1,200.00 through the app: the deposit (600.00) is open. */
async function withOpenDeposit(): Promise<Team & { depositId: string }> {
  const t = await makeTeam("stand_load_check");
  const q = await issuedQuote(t.project, t.lead);
  const client = await signedIn(t.client);
  const { hash } = (await client.get(`/api/projects/${t.project.id}/quotes`)).json.current;
  const res = await client.post(`/api/projects/${t.project.id}/quotes/${q.id}/accept`, { typedName: t.client.name, seenHash: hash });
  expect(res.status).toBe(201);
  return { ...t, depositId: res.json.depositInvoiceId };
}

const paymentsFor = (invoiceId: string) => db().select().from(payments).where(eq(payments.invoiceId, invoiceId));

describe("card payments through the payment service's SDK and the local fake", () => {
  it("marks the invoice paid once, from the verified webhook only, however often it arrives and with bad signatures mixed in", async () => {
    const t = await withOpenDeposit();
    const client = await signedIn(t.client);
    const start = await client.post(`/api/invoices/${t.depositId}/checkout`);
    expect(start.status).toBe(201);
    expect(start.json.url.startsWith(`${PAYMENTS_URL}/pay/cs_test_`)).toBe(true);
    const sessionId = start.json.url.split("/pay/")[1];
    // The return page is not proof of payment: visiting it changes nothing.
    await client.get(`/projects/${t.project.id}/money?payment=returned`);
    expect((await invoicesOf(t.project))[0].status).toBe("open");

    const paid = await payOnFake(start.json.url);
    expect(paid.status).toBe(303);
    expect(paid.headers.get("location")).toBe(`${TEST_APP_URL}/projects/${t.project.id}/money?payment=returned`);
    const event = (await fakeEvents()).find((e) => e.type === "checkout.session.completed" && JSON.parse(e.payload).data.object.id === sessionId)!;
    expect(event.deliveries).toEqual([200]);
    expect((await invoicesOf(t.project))[0]).toMatchObject({ status: "paid" });

    // Twice more from the fake, and the same body with a forged and a missing signature in between.
    const again = await fetch(`${PAYMENTS_URL}/api/events/${event.id}/redeliver`, { method: "POST" }).then((r) => r.json());
    expect(again.status).toBe(200);
    const forged = await postWebhook(TEST_APP_URL, event.payload, sign(event.payload, "whsec_someone_else_entirely"));
    expect(forged.status).toBe(400);
    expect(forged.json?.error).toContain("signature");
    expect((await postWebhook(TEST_APP_URL, event.payload, null)).status).toBe(400);
    const tampered = event.payload.replace(/"amount_total": \d+/, '"amount_total": 1');
    expect((await postWebhook(TEST_APP_URL, tampered, "t=1,v1=" + "0".repeat(64))).status).toBe(400);
    const third = await fetch(`${PAYMENTS_URL}/api/events/${event.id}/redeliver`, { method: "POST" }).then((r) => r.json());
    expect(third.status).toBe(200);

    const rows = await paymentsFor(t.depositId);
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ method: "card", amountMinor: 60_000, reference: sessionId });
    expect(await db().select().from(paymentEvents).where(eq(paymentEvents.id, event.id))).toHaveLength(1);
    const receipts = await db().select().from(notices).where(and(eq(notices.projectId, t.project.id), eq(notices.kind, "receipt")));
    expect(receipts).toHaveLength(1);
    expect(receipts[0].toEmail).toBe(t.client.email);

    // Out of order: the session's expiry arriving after its completion changes nothing.
    const expired = await fetch(`${PAYMENTS_URL}/api/sessions/${sessionId}/expire`, { method: "POST" }).then((r) => r.json());
    expect(expired.status).toBe(200);
    expect((await invoicesOf(t.project))[0].status).toBe("paid");
    expect((await db().select().from(cardCheckouts).where(eq(cardCheckouts.sessionId, sessionId)))[0].status).toBe("completed");

    // Paying a paid invoice is refused before anything reaches the payment service.
    const twice = await client.post(`/api/invoices/${t.depositId}/checkout`);
    expect(twice.status).toBe(409);
    expect(twice.json.error).toContain("already paid");
  });

  it("refuses a signed webhook about a checkout it never started, and stores nothing", async () => {
    const payload = JSON.stringify({ id: `evt_unknown_${Date.now()}`, object: "event", type: "checkout.session.completed", data: { object: { id: "cs_test_nobody", object: "checkout.session", payment_status: "paid", amount_total: 100, client_reference_id: "00000000-0000-4000-8000-000000000000" } } });
    const res = await postWebhook(TEST_APP_URL, payload, sign(payload));
    expect(res.status).toBe(400);
    expect(res.json?.error).toContain("isn't for an invoice we issued");
    expect(await db().select().from(paymentEvents).where(eq(paymentEvents.id, JSON.parse(payload).id))).toHaveLength(0);
    expect((await postWebhook(TEST_APP_URL, "not json at all", sign("not json at all"))).status).toBe(400);
  });

  it("tolerates an expiry arriving before a late completion: the money received still counts", async () => {
    const t = await withOpenDeposit();
    const start = await (await signedIn(t.client)).post(`/api/invoices/${t.depositId}/checkout`);
    const sessionId = start.json.url.split("/pay/")[1];
    const expiry = await fetch(`${PAYMENTS_URL}/api/sessions/${sessionId}/expire`, { method: "POST" }).then((r) => r.json());
    expect(expiry.status).toBe(200);
    expect((await invoicesOf(t.project))[0].status).toBe("open");
    await payOnFake(start.json.url);
    expect((await invoicesOf(t.project))[0].status).toBe("paid");
    expect(await paymentsFor(t.depositId)).toHaveLength(1);
  });

  it("lets a client pay only their own invoices; the lead records transfers, once and for the full amount", async () => {
    const t = await withOpenDeposit();
    const [other, crew, lead, otherCrew] = await Promise.all([signedIn(t.otherClient), signedIn(t.crew), signedIn(t.lead), signedIn(t.otherCrew)]);
    expect((await other.post(`/api/invoices/${t.depositId}/checkout`)).status).toBe(404);
    expect((await otherCrew.post(`/api/invoices/${t.depositId}/checkout`)).status).toBe(404);
    expect((await crew.post(`/api/invoices/${t.depositId}/checkout`)).status).toBe(403);
    expect((await lead.post(`/api/invoices/${t.depositId}/checkout`)).status).toBe(403);
    expect((await other.get(`/api/projects/${t.project.id}/invoices`)).status).toBe(404);
    expect((await crew.get(`/api/projects/${t.project.id}/invoices`)).status).toBe(403);
    expect((await (await signedIn(t.client)).get(`/api/projects/${t.project.id}/invoices`)).json.invoices).toHaveLength(1);
    expect((await other.get(`/print/invoice/${t.depositId}`)).status).toBe(404);
    expect((await other.post(`/api/invoices/00000000-0000-4000-8000-000000000000/checkout`)).status).toBe(404);
    expect(await db().select().from(cardCheckouts).where(eq(cardCheckouts.invoiceId, t.depositId))).toHaveLength(0);

    const transfer = { amountMinor: 60_000, receivedOn: "2026-12-01", reference: "BANK-REF-77" };
    expect((await (await signedIn(t.client)).post(`/api/invoices/${t.depositId}/transfer`, transfer)).status).toBe(403);
    expect((await lead.post(`/api/invoices/${t.depositId}/transfer`, { ...transfer, amountMinor: 59_999 })).status).toBe(422);
    expect((await lead.post(`/api/invoices/${t.depositId}/transfer`, { ...transfer, amountMinor: -5 })).status).toBe(400);
    expect((await lead.post(`/api/invoices/${t.depositId}/transfer`, { ...transfer, amountMinor: 1e15 })).status).toBe(400);
    expect(await paymentsFor(t.depositId)).toHaveLength(0);
    expect((await lead.post(`/api/invoices/${t.depositId}/transfer`, transfer)).status).toBe(201);
    const again = await lead.post(`/api/invoices/${t.depositId}/transfer`, transfer);
    expect(again.status).toBe(409);
    expect(await paymentsFor(t.depositId)).toHaveLength(1);
    expect(await db().select().from(quoteAcceptances).where(eq(quoteAcceptances.projectId, t.project.id))).toHaveLength(1);
  });
});
