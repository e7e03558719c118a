import "server-only";
import { eq } from "drizzle-orm";
import type Stripe from "stripe";
import { db } from "../index";
import { cardCheckouts, paymentEvents, payments } from "../schema";
import { lockInvoice, recordPayment, type InvoiceRow } from "./invoices";
import { INVOICE_KIND_LABELS } from "../../lib/money/schedule";
import { AppError, badRequest, conflict, notFound } from "../../server/errors";
import { paymentsClient } from "../../server/payments";

/**
 * Opens a card checkout at the payment service for an open invoice and remembers its session.
 * The browser is sent to the service's page; only the webhook will mark the invoice paid.
 */
export async function startCardCheckout(opts: { invoice: InvoiceRow; projectTitle: string; userId: string; returnUrl: string }): Promise<{ url: string; sessionId: string }> {
  const inv = opts.invoice;
  if (inv.status === "paid") throw conflict(`Invoice ${inv.number} is already paid; nothing more is due on it.`);
  let session: Stripe.Checkout.Session;
  try {
    session = await paymentsClient().checkout.sessions.create(
      {
        mode: "payment",
        client_reference_id: inv.id,
        metadata: { invoiceId: inv.id, invoiceNumber: String(inv.number) },
        line_items: [
          {
            quantity: 1,
            price_data: { currency: inv.currency.toLowerCase(), unit_amount: inv.totalMinor, product_data: { name: `Invoice ${inv.number}: ${INVOICE_KIND_LABELS[inv.kind]}, ${opts.projectTitle}` } },
          },
        ],
        success_url: `${opts.returnUrl}?payment=returned`,
        cancel_url: `${opts.returnUrl}?payment=cancelled`,
      },
      { idempotencyKey: `checkout-${inv.id}-${Date.now()}` },
    );
  } catch (error) {
    console.error("[payments] checkout failed", error);
    throw new AppError(503, "The card payment service isn't answering. Try again in a few minutes; nothing was charged.");
  }
  if (!session.url) throw new AppError(503, "The card payment service didn't give a payment page. Try again in a few minutes; nothing was charged.");
  await db().insert(cardCheckouts).values({ sessionId: session.id, invoiceId: inv.id, amountMinor: inv.totalMinor, createdBy: opts.userId });
  return { url: session.url, sessionId: session.id };
}

/** The lead records a bank transfer received for an invoice. */
export async function recordTransfer(opts: { invoiceId: string; userId: string; amountMinor: number; receivedOn: string; reference: string; now?: Date }) {
  const now = opts.now ?? new Date();
  return db().transaction(async (tx) => {
    const inv = await lockInvoice(tx, opts.invoiceId);
    if (!inv) throw notFound("That invoice");
    if (inv.status === "paid") throw conflict(`Invoice ${inv.number} is already paid; nothing was recorded.`);
    if (opts.amountMinor !== inv.totalMinor) {
      throw new AppError(422, `Invoice ${inv.number} is for the full amount; record a transfer of exactly that amount.`, { amount: "Must equal the invoice's total." });
    }
    await recordPayment(tx, inv, { method: "transfer", amountMinor: opts.amountMinor, reference: opts.reference, receivedOn: opts.receivedOn, recordedBy: opts.userId, now });
    return { invoiceId: inv.id, status: "paid" as const };
  });
}

export type EventOutcome = { duplicate: boolean; outcome: string; invoiceId: string | null };

/**
 * Applies one verified webhook event exactly once. The event id is stored in the same transaction
 * as its effect, so a repeat (even a concurrent one) changes nothing. Events may arrive in any
 * order: a completed checkout is final, and an expiry that arrives after it is ignored.
 * An event about a checkout this app never started is refused with a 400 and not stored.
 */
export async function processPaymentEvent(event: Stripe.Event, now = new Date()): Promise<EventOutcome> {
  return db().transaction(async (tx) => {
    const inserted = await tx.insert(paymentEvents).values({ id: event.id, type: event.type, outcome: "processing" }).onConflictDoNothing().returning({ id: paymentEvents.id });
    if (!inserted.length) {
      const [seen] = await tx.select().from(paymentEvents).where(eq(paymentEvents.id, event.id));
      return { duplicate: true, outcome: seen?.outcome ?? "seen", invoiceId: seen?.invoiceId ?? null };
    }
    const finish = async (outcome: string, invoiceId: string | null) => {
      await tx.update(paymentEvents).set({ outcome, invoiceId }).where(eq(paymentEvents.id, event.id));
      return { duplicate: false, outcome, invoiceId };
    };
    if (!event.type.startsWith("checkout.session.")) return finish("ignored: not about a checkout", null);
    const session = event.data.object as Stripe.Checkout.Session;
    const [checkout] = await tx.select().from(cardCheckouts).where(eq(cardCheckouts.sessionId, session.id)).for("update");
    if (!checkout || (session.client_reference_id && session.client_reference_id !== checkout.invoiceId)) {
      throw badRequest("That payment isn't for an invoice we issued; nothing was changed.");
    }
    const inv = await lockInvoice(tx, checkout.invoiceId);
    if (!inv) throw badRequest("That payment isn't for an invoice we issued; nothing was changed.");

    if (event.type === "checkout.session.expired") {
      if (checkout.status !== "open") return finish(`ignored: checkout already ${checkout.status}`, inv.id);
      await tx.update(cardCheckouts).set({ status: "expired" }).where(eq(cardCheckouts.sessionId, session.id));
      return finish("checkout expired", inv.id);
    }
    if (event.type !== "checkout.session.completed" && event.type !== "checkout.session.async_payment_succeeded") return finish("ignored: no change to payment", inv.id);
    if (session.payment_status !== "paid") return finish("waiting: payment not yet confirmed", inv.id);
    if (session.amount_total !== checkout.amountMinor) throw badRequest("The amount paid doesn't match the checkout; nothing was changed.");

    await tx.update(cardCheckouts).set({ status: "completed" }).where(eq(cardCheckouts.sessionId, session.id));
    const [already] = await tx.select({ id: payments.id }).from(payments).where(eq(payments.reference, session.id));
    if (already) return finish("already recorded for this checkout", inv.id);
    const paidNow = await recordPayment(tx, inv, {
      method: "card",
      amountMinor: checkout.amountMinor,
      reference: session.id,
      receivedOn: now.toISOString().slice(0, 10),
      recordedBy: null,
      now,
    });
    return finish(paidNow ? "paid" : "paid again: the invoice was already paid, refund the second payment", inv.id);
  });
}
