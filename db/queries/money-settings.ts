import "server-only";
import { asc, eq, isNull, sql } from "drizzle-orm";
import { db, type Db, type Tx } from "../index";
import { invoices, moneySettings, paymentSchedules, priceItems, quotes } from "../schema";
import { conflict } from "../../server/errors";
import type { PriceItem } from "../../lib/money/quote-lines";

type Conn = Db | Tx;
const COMPANY_ID = 1;

export type MoneySettings = typeof moneySettings.$inferSelect;

/** The company's money settings, created with the defaults on first use. */
export async function getMoneySettings(conn: Conn = db()): Promise<MoneySettings> {
  const [row] = await conn.select().from(moneySettings).where(eq(moneySettings.companyId, COMPANY_ID));
  if (row) return row;
  await conn.insert(moneySettings).values({ companyId: COMPANY_ID }).onConflictDoNothing();
  const [created] = await conn.select().from(moneySettings).where(eq(moneySettings.companyId, COMPANY_ID));
  return created;
}

/** Saves the settings. The currency is fixed once anything has been quoted or billed in it. */
export async function saveMoneySettings(input: Omit<MoneySettings, "companyId" | "updatedAt">) {
  return db().transaction(async (tx) => {
    const current = await getMoneySettings(tx);
    if (input.currency !== current.currency) {
      const [{ n }] = await tx.select({ n: sql<number>`(select count(*) from ${quotes}) + (select count(*) from ${invoices})` }).from(sql`(select 1) x`);
      if (Number(n) > 0) throw conflict(`Quotes or invoices already exist in ${current.currency}; the company's currency can't change now.`);
    }
    const [row] = await tx.update(moneySettings).set({ ...input, updatedAt: new Date() }).where(eq(moneySettings.companyId, COMPANY_ID)).returning();
    return row;
  });
}

type Schedule = typeof paymentSchedules.$inferSelect;

/**
 * A project's schedule: its own once saved or used for an invoice, else the company default as it
 * stands today (`updatedAt` null). Reading never writes, so looking at a project changes nothing.
 */
export async function getSchedule(projectId: string, conn: Conn = db()): Promise<Omit<Schedule, "updatedAt"> & { updatedAt: Date | null }> {
  const [row] = await conn.select().from(paymentSchedules).where(eq(paymentSchedules.projectId, projectId));
  if (row) return row;
  const s = await getMoneySettings(conn);
  return { projectId, depositBp: s.depositBp, progressBp: s.progressBp, monthlyPlanMinor: null, monthlyPlanTaxBp: s.defaultTaxBp, updatedAt: null };
}

/**
 * The project's own schedule, copied from the company default the first time one is needed for a
 * write (an invoice, an edit), so a later change of the default never alters a project already billed.
 */
export async function ensureSchedule(projectId: string, conn: Conn = db()): Promise<Schedule> {
  const s = await getMoneySettings(conn);
  await conn.insert(paymentSchedules).values({ projectId, depositBp: s.depositBp, progressBp: s.progressBp, monthlyPlanTaxBp: s.defaultTaxBp }).onConflictDoNothing();
  const [row] = await conn.select().from(paymentSchedules).where(eq(paymentSchedules.projectId, projectId));
  return row;
}

export async function saveSchedule(projectId: string, input: { depositBp: number; progressBp: number; monthlyPlanMinor: number | null; monthlyPlanTaxBp: number }) {
  await ensureSchedule(projectId);
  const [row] = await db()
    .update(paymentSchedules)
    .set({ ...input, updatedAt: new Date() })
    .where(eq(paymentSchedules.projectId, projectId))
    .returning();
  return row;
}

export type PriceItemRow = typeof priceItems.$inferSelect;

export async function listPriceItems(opts: { includeRetired?: boolean } = {}, conn: Conn = db()): Promise<PriceItemRow[]> {
  const q = conn.select().from(priceItems);
  return (opts.includeRetired ? q : q.where(isNull(priceItems.retiredAt))).orderBy(asc(priceItems.group), asc(priceItems.label));
}

export function toPriceItem(r: PriceItemRow): PriceItem {
  return { id: r.id, group: r.group, label: r.label, unit: r.unit, unitPriceMinor: r.unitPriceMinor, taxBp: r.taxBp, basis: r.basis, panelThicknessMm: r.panelThicknessMm };
}

export type PriceItemInput = Pick<PriceItemRow, "group" | "label" | "unit" | "unitPriceMinor" | "taxBp" | "basis" | "panelThicknessMm">;

export async function addPriceItem(input: PriceItemInput, userId: string) {
  const [row] = await db().insert(priceItems).values({ ...input, updatedBy: userId }).returning();
  return row;
}

/** Changes an item's price or wording (quotes already drafted keep their own copies), or retires it. */
export async function updatePriceItem(id: string, input: Partial<PriceItemInput> & { retired?: boolean }, userId: string) {
  const { retired, ...fields } = input;
  const [row] = await db()
    .update(priceItems)
    .set({ ...fields, ...(retired === undefined ? {} : { retiredAt: retired ? new Date() : null }), updatedBy: userId, updatedAt: new Date() })
    .where(eq(priceItems.id, id))
    .returning();
  return row ?? null;
}
