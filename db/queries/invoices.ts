import "server-only";
import { and, asc, desc, eq, inArray, ne, sql } from "drizzle-orm";
import { db, type Db, type Tx } from "../index";
import { invoiceCounters, invoices, paymentSchedules, payments, projects, quoteAcceptances, quotes, users } from "../schema";
import { getMoneySettings, ensureSchedule } from "./money-settings";
import { companyName, enqueueNotice } from "./outbox";
import { splitSchedule, instalmentAmount, INVOICE_KIND_LABELS, instalmentsDueOnMove, type Instalment, type InvoiceKind } from "../../lib/money/schedule";
import { splitByWeights } from "../../lib/money/amounts";
import { receiptEmail } from "../../lib/mail/receipt-email";
import { env } from "../../env";
import type { Stage } from "../../lib/stages/stages";

type Conn = Db | Tx;
export type InvoiceRow = typeof invoices.$inferSelect;
const COMPANY_ID = 1;
const DAY = 86_400_000;

/**
 * Takes the company's next invoice number. The counter row stays locked until the caller's
 * transaction ends, so concurrent invoices queue here; a rolled-back invoice gives its number back.
 */
export async function takeInvoiceNumber(tx: Tx): Promise<number> {
  await tx.insert(invoiceCounters).values({ companyId: COMPANY_ID, nextNumber: 1 }).onConflictDoNothing();
  const [row] = await tx
    .update(invoiceCounters)
    .set({ nextNumber: sql`${invoiceCounters.nextNumber} + 1` })
    .where(eq(invoiceCounters.companyId, COMPANY_ID))
    .returning({ next: invoiceCounters.nextNumber });
  return row.next - 1;
}

export async function createInvoice(
  tx: Tx,
  v: { projectId: string; quoteId: string | null; kind: InvoiceKind; period?: string | null; totalMinor: number; taxMinor: number; now: Date },
): Promise<InvoiceRow> {
  const settings = await getMoneySettings(tx);
  const number = await takeInvoiceNumber(tx);
  const dueOn = new Date(v.now.getTime() + settings.paymentTermsDays * DAY).toISOString().slice(0, 10);
  const tax = Math.min(v.taxMinor, v.totalMinor);
  const [row] = await tx
    .insert(invoices)
    .values({
      number,
      projectId: v.projectId,
      quoteId: v.quoteId,
      kind: v.kind,
      period: v.period ?? null,
      currency: settings.currency,
      netMinor: v.totalMinor - tax,
      taxMinor: tax,
      totalMinor: v.totalMinor,
      issuedAt: v.now,
      dueOn,
    })
    .returning();
  return row;
}

/** The newest acceptance on the project: the total the schedule bills against. */
export async function latestAcceptance(conn: Conn, projectId: string) {
  const [row] = await conn
    .select({ quoteId: quotes.id, totalMinor: quotes.totalMinor, taxMinor: quotes.taxMinor })
    .from(quoteAcceptances)
    .innerJoin(quotes, eq(quotes.id, quoteAcceptances.quoteId))
    .where(eq(quoteAcceptances.projectId, projectId))
    .orderBy(desc(quoteAcceptances.acceptedAt), desc(quotes.version))
    .limit(1);
  return row ?? null;
}

/**
 * Issues one instalment of the schedule against the accepted total, once: nothing when there is no
 * accepted quote, when it was already issued, or when its share is zero.
 */
export async function issueInstalment(tx: Tx, opts: { projectId: string; kind: Instalment; now: Date }): Promise<InvoiceRow | null> {
  const accepted = await latestAcceptance(tx, opts.projectId);
  if (!accepted) return null;
  const billed = await tx
    .select({ kind: invoices.kind, totalMinor: invoices.totalMinor, taxMinor: invoices.taxMinor })
    .from(invoices)
    .where(and(eq(invoices.projectId, opts.projectId), ne(invoices.kind, "monthly")));
  if (billed.some((b) => b.kind === opts.kind)) return null;
  const schedule = await ensureSchedule(opts.projectId, tx);
  const shares = { depositBp: schedule.depositBp, progressBp: schedule.progressBp };
  const billedTotal = billed.reduce((s, b) => s + b.totalMinor, 0);
  const billedTax = billed.reduce((s, b) => s + b.taxMinor, 0);
  const total = instalmentAmount(opts.kind, accepted.totalMinor, shares, billedTotal);
  if (total <= 0) return null;
  const tax = opts.kind === "balance" ? Math.max(0, accepted.taxMinor - billedTax) : splitSchedule(accepted.taxMinor, shares)[opts.kind];
  return createInvoice(tx, { projectId: opts.projectId, quoteId: accepted.quoteId, kind: opts.kind, totalMinor: total, taxMinor: tax, now: opts.now });
}

/** The instalments a card move makes due (install day, handover), issued in the move's transaction. */
export async function issueInstalmentsOnMove(tx: Tx, opts: { projectId: string; from: Stage; to: Stage; now: Date }) {
  for (const kind of instalmentsDueOnMove(opts.from, opts.to)) await issueInstalment(tx, { projectId: opts.projectId, kind, now: opts.now });
}

/**
 * Bills one month of every in-service project's monthly plan, once per project and month. Each
 * project's invoice is its own transaction; returns how many were issued.
 */
export async function billMonthlyPlans(period: string, now = new Date()): Promise<number> {
  const due = await db()
    .select({ projectId: paymentSchedules.projectId, amount: paymentSchedules.monthlyPlanMinor, taxBp: paymentSchedules.monthlyPlanTaxBp })
    .from(paymentSchedules)
    .innerJoin(projects, eq(projects.id, paymentSchedules.projectId))
    .where(and(eq(projects.stage, "in_service"), sql`${paymentSchedules.monthlyPlanMinor} > 0`));
  let issued = 0;
  for (const d of due) {
    const made = await db().transaction(async (tx) => {
      await tx.select({ id: projects.id }).from(projects).where(eq(projects.id, d.projectId)).for("update");
      const [exists] = await tx
        .select({ id: invoices.id })
        .from(invoices)
        .where(and(eq(invoices.projectId, d.projectId), eq(invoices.kind, "monthly"), eq(invoices.period, period)));
      if (exists) return false;
      // The plan amount includes tax: tax = amount × rate ÷ (1 + rate), split off exactly.
      const [net, tax] = splitByWeights(d.amount!, [10_000, d.taxBp]);
      await createInvoice(tx, { projectId: d.projectId, quoteId: null, kind: "monthly", period, totalMinor: net + tax, taxMinor: tax, now });
      return true;
    });
    if (made) issued++;
  }
  return issued;
}

export async function listProjectInvoices(projectId: string, conn: Conn = db()) {
  return conn.select().from(invoices).where(eq(invoices.projectId, projectId)).orderBy(asc(invoices.number));
}

export async function listInvoicePayments(invoiceIds: string[], conn: Conn = db()) {
  if (!invoiceIds.length) return [];
  return conn
    .select({ id: payments.id, invoiceId: payments.invoiceId, method: payments.method, amountMinor: payments.amountMinor, reference: payments.reference, receivedOn: payments.receivedOn, recordedByName: users.name })
    .from(payments)
    .leftJoin(users, eq(users.id, payments.recordedBy))
    .where(inArray(payments.invoiceId, invoiceIds))
    .orderBy(asc(payments.createdAt));
}

export async function getInvoice(invoiceId: string, conn: Conn = db()) {
  const [row] = await conn.select().from(invoices).where(eq(invoices.id, invoiceId));
  return row ?? null;
}

/**
 * Records money received against an invoice (the caller holds the invoice's row lock), marks it
 * paid, and queues the client's receipt, in the caller's transaction.
 */
export async function recordPayment(
  tx: Tx,
  inv: InvoiceRow,
  p: { method: "card" | "transfer"; amountMinor: number; reference: string; receivedOn: string; recordedBy: string | null; now: Date },
) {
  await tx.insert(payments).values({ invoiceId: inv.id, method: p.method, amountMinor: p.amountMinor, reference: p.reference, receivedOn: p.receivedOn, recordedBy: p.recordedBy });
  if (inv.status === "paid") return false;
  await tx.update(invoices).set({ status: "paid", paidAt: p.now }).where(eq(invoices.id, inv.id));
  const [project] = await tx
    .select({ id: projects.id, title: projects.title, clientId: projects.clientId, clientName: users.name, clientEmail: users.email })
    .from(projects)
    .innerJoin(users, eq(users.id, projects.clientId))
    .where(eq(projects.id, inv.projectId));
  await enqueueNotice(tx, {
    kind: "receipt",
    projectId: project.id,
    recipientId: project.clientId,
    toEmail: project.clientEmail,
    email: receiptEmail({
      companyName: await companyName(tx),
      recipientName: project.clientName,
      projectTitle: project.title,
      invoiceNumber: inv.number,
      what: INVOICE_KIND_LABELS[inv.kind] + (inv.period ? ` ${inv.period}` : ""),
      amountMinor: p.amountMinor,
      currency: inv.currency,
      method: p.method,
      receivedOn: p.receivedOn,
      url: `${env().APP_URL}/projects/${project.id}/money`,
    }),
  });
  return true;
}

export async function lockInvoice(tx: Tx, invoiceId: string) {
  const [row] = await tx.select().from(invoices).where(eq(invoices.id, invoiceId)).for("update");
  return row ?? null;
}
