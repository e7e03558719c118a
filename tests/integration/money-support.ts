/** Money records written straight to the test database, and helpers that talk to the payment fake. */
import { eq, sql } from "drizzle-orm";
import Stripe from "stripe";
import { db } from "@/db";
import { invoices, payments, quoteAcceptances, quoteLines, quotes } from "@/db/schema";

type Id = { id: string };

export const PAYMENTS_URL = process.env.TEST_PAYMENTS_URL ?? "http://127.0.0.1:4575";
// The local defaults in env.ts, which the test run uses for the app and the fake alike.
export const WEBHOOK_SECRET = process.env.PAYMENTS_WEBHOOK_SECRET ?? "whsec_tankwright_local_fake";

/** A current quote of one line (1,000.00 + 20 % tax = 1,200.00), issued but not accepted. */
export async function issuedQuote(project: Id, lead: Id, unitPriceMinor = 100_000) {
  const tax = unitPriceMinor / 5;
  const [q] = await db()
    .insert(quotes)
    .values({ projectId: project.id, version: 1, status: "current", currency: "GBP", netMinor: unitPriceMinor, taxMinor: tax, totalMinor: unitPriceMinor + tax, createdBy: lead.id, issuedAt: new Date() })
    .returning();
  await db()
    .insert(quoteLines)
    .values({ quoteId: q.id, position: 0, group: "labour", description: "Fixture work", unit: "each", quantityMilli: 1000, unitPriceMinor, taxBp: 2000, netMinor: unitPriceMinor, taxMinor: tax, totalMinor: unitPriceMinor + tax });
  return q;
}

/**
 * The deposit paid by transfer, as a gate fixture: a current quote accepted by the client and its
 * deposit invoice paid. The invoice number comes from the same locked counter the app uses.
 */
export async function payDeposit(project: Id, client: Id, lead: Id) {
  const q = await issuedQuote(project, lead);
  await db().insert(quoteAcceptances).values({ quoteId: q.id, projectId: project.id, acceptedBy: client.id, typedName: "Fixture Client", contentHash: "0".repeat(64), totalMinor: q.totalMinor });
  await db().transaction(async (tx) => {
    await tx.execute(sql`insert into invoice_counters (company_id, next_number) values (1, 1) on conflict do nothing`);
    const res = await tx.execute(sql`update invoice_counters set next_number = next_number + 1 where company_id = 1 returning next_number - 1 as n`);
    const number = Number((res.rows[0] as { n: number }).n);
    const [inv] = await tx
      .insert(invoices)
      .values({ number, projectId: project.id, quoteId: q.id, kind: "deposit", currency: "GBP", netMinor: 50_000, taxMinor: 10_000, totalMinor: 60_000, status: "paid", paidAt: new Date(), dueOn: new Date().toISOString().slice(0, 10) })
      .returning();
    await tx.insert(payments).values({ invoiceId: inv.id, method: "transfer", amountMinor: 60_000, reference: `fixture-${inv.number}`, receivedOn: new Date().toISOString().slice(0, 10), recordedBy: lead.id });
  });
}

export async function invoicesOf(project: Id) {
  return db().select().from(invoices).where(eq(invoices.projectId, project.id)).orderBy(invoices.number);
}

/** Signs a payload exactly as the payment service does, with the SDK's own test helper. */
export function sign(payload: string, secret = WEBHOOK_SECRET): string {
  return new Stripe("sk_test_unused").webhooks.generateTestHeaderString({ payload, secret });
}

export async function postWebhook(appUrl: string, payload: string, signature: string | null) {
  const headers: Record<string, string> = { "content-type": "application/json" };
  if (signature !== null) headers["stripe-signature"] = signature;
  const res = await fetch(`${appUrl}/api/payments/webhook`, { method: "POST", headers, body: payload });
  return { status: res.status, json: (await res.json().catch(() => null)) as Record<string, any> | null };
}

export type FakeEvent = { id: string; type: string; deliveries: number[]; payload: string };

export async function fakeEvents(): Promise<FakeEvent[]> {
  return (await fetch(`${PAYMENTS_URL}/api/events`)).json() as Promise<FakeEvent[]>;
}

/** Presses the fake's "Pay now" button for a checkout, as the browser would. */
export async function payOnFake(checkoutUrl: string) {
  return fetch(checkoutUrl, { method: "POST", redirect: "manual" });
}
