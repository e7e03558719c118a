import { and, asc, eq } from "drizzle-orm";
import type { Tx } from "../index";
import { invoices, moneySettings, projects, paymentSchedules, payments, priceItems, quoteAcceptances, quoteLines, quotes, stageEvents, users } from "../schema";
import type { FeatureSeed } from "./demo-features";
import { DEMO_DESIGNS } from "./demo-survey";
import { createInvoice, issueInstalment } from "../queries/invoices";
import { quoteView } from "../queries/quotes";
import { quoteTotals, splitByWeights } from "../../lib/money/amounts";
import { draftLinesFromDesign, type PriceItem } from "../../lib/money/quote-lines";
import type { Stage } from "../../lib/stages/stages";

const DAY = 24 * 3600 * 1000;

/** The demo company's invented price list, in pence before tax (20 %). */
const PRICES: Omit<PriceItem, "id">[] = [
  { group: "tank_glass", label: "Float glass panels, 6 mm, cut and polished", unit: "m²", unitPriceMinor: 6800, taxBp: 2000, basis: "glass_area_m2", panelThicknessMm: 6 },
  { group: "tank_glass", label: "Float glass panels, 8 mm, cut and polished", unit: "m²", unitPriceMinor: 8900, taxBp: 2000, basis: "glass_area_m2", panelThicknessMm: 8 },
  { group: "tank_glass", label: "Glass panels, 12 mm, cut and polished", unit: "m²", unitPriceMinor: 13500, taxBp: 2000, basis: "glass_area_m2", panelThicknessMm: 12 },
  { group: "tank_glass", label: "Low-iron glass panels, 15 mm", unit: "m²", unitPriceMinor: 21000, taxBp: 2000, basis: "glass_area_m2", panelThicknessMm: 15 },
  { group: "tank_glass", label: "Low-iron glass panels, 19 mm", unit: "m²", unitPriceMinor: 26500, taxBp: 2000, basis: "glass_area_m2", panelThicknessMm: 19 },
  { group: "tank_glass", label: "Acrylic sheet, 25 mm, formed", unit: "m²", unitPriceMinor: 38000, taxBp: 2000, basis: "glass_area_m2", panelThicknessMm: 25 },
  { group: "tank_glass", label: "Tank bonding, bracing and 7-day cure", unit: "each", unitPriceMinor: 42000, taxBp: 2000, basis: "per_quote", panelThicknessMm: null },
  { group: "stand_cabinet", label: "Welded steel stand with cabinet, built to size", unit: "each", unitPriceMinor: 118000, taxBp: 2000, basis: "per_quote", panelThicknessMm: null },
  { group: "filtration_equipment", label: "Filtration, heating and return pump set", unit: "each", unitPriceMinor: 64500, taxBp: 2000, basis: "per_quote", panelThicknessMm: null },
  { group: "filtration_equipment", label: "Water conditioner and start-up bacteria", unit: "L of water", unitPriceMinor: 4, taxBp: 2000, basis: "net_volume_l", panelThicknessMm: null },
  { group: "lighting", label: "Dimmable LED light rail with timer", unit: "each", unitPriceMinor: 38500, taxBp: 2000, basis: "per_quote", panelThicknessMm: null },
  { group: "aquascape_materials", label: "Substrate, washed and graded", unit: "kg", unitPriceMinor: 320, taxBp: 2000, basis: "substrate_kg", panelThicknessMm: null },
  { group: "aquascape_materials", label: "Hardscape rock, selected and scrubbed", unit: "kg", unitPriceMinor: 650, taxBp: 2000, basis: "rock_kg", panelThicknessMm: null },
  { group: "livestock", label: "Quarantined fish batch (per fish)", unit: "fish", unitPriceMinor: 850, taxBp: 2000, basis: "manual", panelThicknessMm: null },
  { group: "labour", label: "Site survey, design and load check", unit: "each", unitPriceMinor: 35000, taxBp: 2000, basis: "per_quote", panelThicknessMm: null },
  { group: "labour", label: "Install day crew (two people)", unit: "hour", unitPriceMinor: 9500, taxBp: 2000, basis: "manual", panelThicknessMm: null },
];

const QUOTED_ONLY = ["aldous-hall"];
const ACCEPTED_UNPAID = ["quist-study"];
/** Paid deposits by bank transfer; the rest paid by card. */
const BY_TRANSFER = new Set(["marchetti-kitchen", "quist-living", "ashdown-surgery"]);
/** Invoices left unpaid in the demo, so the Money page has something open and something overdue. */
const UNPAID = new Set(["ashdown-reception:progress", "marchetti-dining:balance", "marchetti-dining:monthly"]);

async function stageEntered(tx: Tx, projectId: string, stage: Stage): Promise<Date | null> {
  const [e] = await tx.select({ at: stageEvents.at }).from(stageEvents).where(and(eq(stageEvents.projectId, projectId), eq(stageEvents.toStage, stage))).orderBy(asc(stageEvents.at)).limit(1);
  return e?.at ?? null;
}

async function markPaid(tx: Tx, inv: typeof invoices.$inferSelect, method: "card" | "transfer", at: Date, leadId: string, n: number) {
  await tx.insert(payments).values({
    invoiceId: inv.id,
    method,
    amountMinor: inv.totalMinor,
    reference: method === "card" ? `cs_demo_${inv.number}_${n}` : `SSA-${inv.number}-${1000 + n}`,
    receivedOn: at.toISOString().slice(0, 10),
    recordedBy: method === "transfer" ? leadId : null,
    createdAt: at,
  });
  await tx.update(invoices).set({ status: "paid", paidAt: at }).where(eq(invoices.id, inv.id));
}

/**
 * The demo's money: a price list, a quote per designed tank, and for every install past the stand
 * & load check an accepted quote with its deposit paid, so the deposit gate holds for the demo.
 */
export const seedDemoMoney: FeatureSeed = async (tx, { now, projectIds, peopleIds }) => {
  await tx.insert(moneySettings).values({ companyId: 1, currency: "GBP", depositBp: 5000, progressBp: 3000, defaultTaxBp: 2000, paymentTermsDays: 14 }).onConflictDoNothing();
  const items = await tx
    .insert(priceItems)
    .values(PRICES.map((p) => ({ ...p, updatedBy: peopleIds.lead })))
    .returning();
  const priceList: PriceItem[] = items.map((i) => ({ id: i.id, group: i.group, label: i.label, unit: i.unit, unitPriceMinor: i.unitPriceMinor, taxBp: i.taxBp, basis: i.basis, panelThicknessMm: i.panelThicknessMm }));
  let n = 0;
  for (const [key, design] of Object.entries(DEMO_DESIGNS)) {
    const projectId = projectIds[key];
    if (!projectId) continue;
    n++;
    const aquascapeAt = await stageEntered(tx, projectId, "aquascape");
    const past = aquascapeAt !== null;
    if (!past && !QUOTED_ONLY.includes(key) && !ACCEPTED_UNPAID.includes(key)) continue;
    const lines = draftLinesFromDesign(priceList, design);
    lines.push({ group: "labour", description: "Install day crew (two people)", unit: "hour", quantityMilli: 8000, unitPriceMinor: 9500, discountBp: 0, taxBp: 2000, priceItemId: items.find((i) => i.basis === "manual" && i.group === "labour")!.id });
    const totals = quoteTotals(lines);
    const issuedAt = new Date((aquascapeAt ?? now).getTime() - 12 * DAY);
    const inService = key === "marchetti-dining" || key === "ashdown-surgery";
    await tx.insert(paymentSchedules).values({ projectId, depositBp: 5000, progressBp: 3000, monthlyPlanMinor: inService ? 5400 : null, monthlyPlanTaxBp: 2000 });

    if (QUOTED_ONLY.includes(key)) {
      // An earlier version replaced after the client asked for a lower stand.
      const [v1] = await tx
        .insert(quotes)
        .values({ projectId, version: 1, status: "superseded", currency: "GBP", netMinor: totals.netMinor + 20000, taxMinor: totals.taxMinor + 4000, totalMinor: totals.totalMinor + 24000, createdBy: peopleIds.lead, createdAt: issuedAt, issuedAt, supersededAt: new Date(now.getTime() - 2 * DAY) })
        .returning();
      await tx.insert(quoteLines).values(lines.map((l, i) => ({ ...l, quoteId: v1.id, position: i, ...totals.lines[i] })));
    }
    const version = QUOTED_ONLY.includes(key) ? 2 : 1;
    const [q] = await tx
      .insert(quotes)
      .values({ projectId, version, status: "current", currency: "GBP", notes: "Prices include delivery within 40 km. Electrical work near the tank is by the client's licensed electrician.", ...totals, createdBy: peopleIds.lead, createdAt: issuedAt, issuedAt: QUOTED_ONLY.includes(key) ? new Date(now.getTime() - 2 * DAY) : issuedAt })
      .returning();
    const written = await tx.insert(quoteLines).values(lines.map((l, i) => ({ ...l, quoteId: q.id, position: i, ...totals.lines[i] }))).returning();
    if (QUOTED_ONLY.includes(key)) continue;

    const acceptedAt = new Date(past ? aquascapeAt!.getTime() - 9 * DAY : now.getTime() - 3 * DAY);
    const [project] = await tx.select({ clientId: users.id, name: users.name }).from(projects).innerJoin(users, eq(users.id, projects.clientId)).where(eq(projects.id, projectId));
    const { hash } = await quoteView(q, written, tx);
    await tx.insert(quoteAcceptances).values({ quoteId: q.id, projectId, acceptedBy: project.clientId, typedName: project.name, acceptedAt, ipAddress: `192.0.2.${10 + n}`, userAgent: "demo", contentHash: hash, totalMinor: q.totalMinor });
    const deposit = await issueInstalment(tx, { projectId, kind: "deposit", now: acceptedAt });
    if (!past || !deposit) continue;
    await markPaid(tx, deposit, BY_TRANSFER.has(key) ? "transfer" : "card", new Date(acceptedAt.getTime() + 2 * DAY), peopleIds.lead, n);

    const progress = await issueInstalment(tx, { projectId, kind: "progress", now: aquascapeAt });
    if (progress && !UNPAID.has(`${key}:progress`) && (await stageEntered(tx, projectId, "fill_leak_test"))) {
      await markPaid(tx, progress, BY_TRANSFER.has(key) ? "transfer" : "card", new Date(aquascapeAt.getTime() + 3 * DAY), peopleIds.lead, n + 100);
    }
    const handoverAt = await stageEntered(tx, projectId, "in_service");
    if (!handoverAt) continue;
    const balance = await issueInstalment(tx, { projectId, kind: "balance", now: handoverAt });
    if (balance && !UNPAID.has(`${key}:balance`)) await markPaid(tx, balance, "transfer", new Date(handoverAt.getTime() + 10 * DAY), peopleIds.lead, n + 200);
    // Last month's care plan: 54.00 including 20 % tax.
    const lastMonth = new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth() - 1, 1));
    const [net, tax] = splitByWeights(5400, [10_000, 2000]);
    const monthly = await createInvoice(tx, { projectId, quoteId: null, kind: "monthly", period: lastMonth.toISOString().slice(0, 7), totalMinor: net + tax, taxMinor: tax, now: lastMonth });
    if (!UNPAID.has(`${key}:monthly`)) await markPaid(tx, monthly, "card", new Date(lastMonth.getTime() + 5 * DAY), peopleIds.lead, n + 300);
  }
};
