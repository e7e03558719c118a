import "server-only";
import { createHash } from "node:crypto";
import { and, asc, desc, eq, inArray } from "drizzle-orm";
import { db, type Db, type Tx } from "../index";
import { projects, quoteAcceptances, quoteLines, quotes, tankDesigns, users } from "../schema";
import { companyName } from "./outbox";
import { getMoneySettings, listPriceItems, toPriceItem } from "./money-settings";
import { issueInstalment } from "./invoices";
import { AmountError, quoteTotals } from "../../lib/money/amounts";
import { draftLinesFromDesign, type DraftLine } from "../../lib/money/quote-lines";
import { canonicalQuoteText, type QuoteView } from "../../lib/money/quote-view";
import { validateDesign, type TankDesign } from "../../lib/tank/design";
import { AppError, badRequest, conflict, notFound, unprocessable } from "../../server/errors";

type Conn = Db | Tx;
export type QuoteRow = typeof quotes.$inferSelect;
export type QuoteLineRow = typeof quoteLines.$inferSelect;
export type AcceptanceRow = typeof quoteAcceptances.$inferSelect;

async function lockProject(tx: Tx, projectId: string) {
  const [p] = await tx.select({ id: projects.id, title: projects.title }).from(projects).where(eq(projects.id, projectId)).for("update");
  if (!p) throw notFound();
  return p;
}

async function designFor(conn: Conn, projectId: string): Promise<TankDesign | null> {
  const [row] = await conn.select({ data: tankDesigns.data }).from(tankDesigns).where(eq(tankDesigns.projectId, projectId));
  if (!row) return null;
  const design = row.data as unknown as TankDesign;
  try {
    return validateDesign(design).length ? null : design;
  } catch {
    return null;
  }
}

/** Every version of the project's quote, newest first, with lines and acceptance. */
export async function listQuotes(projectId: string, conn: Conn = db()) {
  const rows = await conn.select().from(quotes).where(eq(quotes.projectId, projectId)).orderBy(desc(quotes.version));
  if (!rows.length) return [];
  const ids = rows.map((r) => r.id);
  const [lines, accepts] = await Promise.all([
    conn.select().from(quoteLines).where(inArray(quoteLines.quoteId, ids)).orderBy(asc(quoteLines.position)),
    conn.select().from(quoteAcceptances).where(inArray(quoteAcceptances.quoteId, ids)),
  ]);
  return rows.map((q) => ({ ...q, lines: lines.filter((l) => l.quoteId === q.id), acceptance: accepts.find((a) => a.quoteId === q.id) ?? null }));
}

export type QuoteWithLines = Awaited<ReturnType<typeof listQuotes>>[number];

/**
 * Starts the next version as a draft: from the design and the price list, or as a copy of the
 * current version. Only one draft at a time.
 */
export async function createDraftQuote(opts: { projectId: string; userId: string; from: "design" | "current" }) {
  return db().transaction(async (tx) => {
    await lockProject(tx, opts.projectId);
    const existing = await tx.select().from(quotes).where(eq(quotes.projectId, opts.projectId)).orderBy(desc(quotes.version));
    const draft = existing.find((q) => q.status === "draft");
    if (draft) throw conflict(`Version ${draft.version} is still a draft: edit or issue it before starting another.`);
    let lines: DraftLine[];
    let notes = "";
    if (opts.from === "current") {
      const current = existing.find((q) => q.status === "current");
      if (!current) throw unprocessable("There is no current quote to copy; draft one from the design.");
      notes = current.notes;
      lines = (await tx.select().from(quoteLines).where(eq(quoteLines.quoteId, current.id)).orderBy(asc(quoteLines.position))).map((l) => ({
        group: l.group,
        description: l.description,
        unit: l.unit,
        quantityMilli: l.quantityMilli,
        unitPriceMinor: l.unitPriceMinor,
        discountBp: l.discountBp,
        taxBp: l.taxBp,
        priceItemId: l.priceItemId,
      }));
    } else {
      const items = (await listPriceItems({}, tx)).map(toPriceItem);
      lines = draftLinesFromDesign(items, await designFor(tx, opts.projectId));
    }
    const settings = await getMoneySettings(tx);
    const [quote] = await tx
      .insert(quotes)
      .values({ projectId: opts.projectId, version: (existing[0]?.version ?? 0) + 1, status: "draft", currency: settings.currency, notes, createdBy: opts.userId })
      .returning();
    await writeLines(tx, quote.id, lines);
    return quote;
  });
}

async function writeLines(tx: Tx, quoteId: string, lines: DraftLine[]) {
  let totals;
  try {
    totals = quoteTotals(lines);
  } catch (error) {
    if (error instanceof AmountError) throw badRequest(error.message);
    throw error;
  }
  await tx.delete(quoteLines).where(eq(quoteLines.quoteId, quoteId));
  if (lines.length) {
    await tx.insert(quoteLines).values(lines.map((l, i) => ({ ...l, quoteId, position: i, ...totals.lines[i] })));
  }
  await tx.update(quotes).set({ netMinor: totals.netMinor, taxMinor: totals.taxMinor, totalMinor: totals.totalMinor }).where(eq(quotes.id, quoteId));
  return totals;
}

async function draftOf(tx: Tx, projectId: string, quoteId: string) {
  const [q] = await tx.select().from(quotes).where(and(eq(quotes.id, quoteId), eq(quotes.projectId, projectId))).for("update");
  if (!q) throw notFound("That quote");
  if (q.status !== "draft") throw conflict(`Version ${q.version} has been issued and can't change; start a new version instead.`);
  return q;
}

/** Replaces a draft's lines and notes; the totals are worked out here, never taken from the browser. */
export async function saveDraftQuote(opts: { projectId: string; quoteId: string; lines: DraftLine[]; notes: string }) {
  return db().transaction(async (tx) => {
    await draftOf(tx, opts.projectId, opts.quoteId);
    await tx.update(quotes).set({ notes: opts.notes }).where(eq(quotes.id, opts.quoteId));
    return writeLines(tx, opts.quoteId, opts.lines);
  });
}

/** Makes a draft the current quote; the version it replaces is kept, marked superseded. */
export async function issueQuote(opts: { projectId: string; quoteId: string; now?: Date }) {
  const now = opts.now ?? new Date();
  return db().transaction(async (tx) => {
    await lockProject(tx, opts.projectId);
    const q = await draftOf(tx, opts.projectId, opts.quoteId);
    if (q.totalMinor <= 0) throw unprocessable("A quote needs at least one priced line before the client can see it.");
    await tx.update(quotes).set({ status: "superseded", supersededAt: now }).where(and(eq(quotes.projectId, opts.projectId), eq(quotes.status, "current")));
    const [issued] = await tx.update(quotes).set({ status: "current", issuedAt: now }).where(eq(quotes.id, q.id)).returning();
    return issued;
  });
}

/** The quote as the client is shown it, and the hash of exactly that. */
export async function quoteView(q: QuoteRow, lines: QuoteLineRow[], conn: Conn = db()): Promise<{ view: QuoteView; hash: string }> {
  const [p] = await conn.select({ title: projects.title }).from(projects).where(eq(projects.id, q.projectId));
  const view: QuoteView = {
    quoteId: q.id,
    projectTitle: p?.title ?? "",
    companyName: await companyName(conn),
    version: q.version,
    currency: q.currency,
    issuedAt: q.issuedAt ? q.issuedAt.toISOString() : null,
    notes: q.notes,
    lines: lines.map((l) => ({
      group: l.group,
      description: l.description,
      unit: l.unit,
      quantityMilli: l.quantityMilli,
      unitPriceMinor: l.unitPriceMinor,
      discountBp: l.discountBp,
      taxBp: l.taxBp,
      netMinor: l.netMinor,
      taxMinor: l.taxMinor,
      totalMinor: l.totalMinor,
    })),
    netMinor: q.netMinor,
    taxMinor: q.taxMinor,
    totalMinor: q.totalMinor,
  };
  return { view, hash: createHash("sha256").update(canonicalQuoteText(view)).digest("hex") };
}

/** The current quote for the client's page, with its view, hash and acceptance; null before one is issued. */
export async function getCurrentQuote(projectId: string, conn: Conn = db()) {
  const [q] = await conn.select().from(quotes).where(and(eq(quotes.projectId, projectId), eq(quotes.status, "current")));
  if (!q) return null;
  const lines = await conn.select().from(quoteLines).where(eq(quoteLines.quoteId, q.id)).orderBy(asc(quoteLines.position));
  const [acceptance] = await conn
    .select({ typedName: quoteAcceptances.typedName, acceptedAt: quoteAcceptances.acceptedAt, byName: users.name, contentHash: quoteAcceptances.contentHash })
    .from(quoteAcceptances)
    .innerJoin(users, eq(users.id, quoteAcceptances.acceptedBy))
    .where(eq(quoteAcceptances.quoteId, q.id));
  return { quote: q, lines, acceptance: acceptance ?? null, ...(await quoteView(q, lines, conn)) };
}

const normaliseName = (s: string) => s.normalize("NFKC").trim().replace(/\s+/g, " ").toLowerCase();

/**
 * The client accepts the current version by typing their name. Stores who, when, from where and
 * the hash of what they saw; the hash they send must match the quote as it is now. Accepting
 * issues the deposit invoice in the same transaction.
 */
export async function acceptQuote(opts: {
  projectId: string;
  quoteId: string;
  user: { id: string; name: string };
  typedName: string;
  seenHash: string;
  ipAddress: string | null;
  userAgent: string | null;
  now?: Date;
}) {
  const now = opts.now ?? new Date();
  return db().transaction(async (tx) => {
    await lockProject(tx, opts.projectId);
    const [q] = await tx.select().from(quotes).where(and(eq(quotes.id, opts.quoteId), eq(quotes.projectId, opts.projectId)));
    if (!q || q.status === "draft") throw notFound("That quote");
    if (q.status === "superseded") {
      const [cur] = await tx.select({ version: quotes.version }).from(quotes).where(and(eq(quotes.projectId, opts.projectId), eq(quotes.status, "current")));
      throw conflict(`Version ${q.version} has been replaced${cur ? ` by version ${cur.version}` : ""}; read the current quote and accept that one.`);
    }
    const [already] = await tx.select({ id: quoteAcceptances.id }).from(quoteAcceptances).where(eq(quoteAcceptances.quoteId, q.id));
    if (already) throw conflict(`Version ${q.version} has already been accepted.`);
    if (normaliseName(opts.typedName) !== normaliseName(opts.user.name)) {
      throw new AppError(422, `Type your name as it is on your account (${opts.user.name}) to accept.`, { typedName: "Type your full name as shown." });
    }
    const lines = await tx.select().from(quoteLines).where(eq(quoteLines.quoteId, q.id)).orderBy(asc(quoteLines.position));
    const { hash } = await quoteView(q, lines, tx);
    if (hash !== opts.seenHash) throw conflict("The quote changed while you were reading it. Read it again, then accept.");
    const [acceptance] = await tx
      .insert(quoteAcceptances)
      .values({
        quoteId: q.id,
        projectId: opts.projectId,
        acceptedBy: opts.user.id,
        typedName: opts.typedName.trim(),
        acceptedAt: now,
        ipAddress: opts.ipAddress,
        userAgent: opts.userAgent?.slice(0, 400) ?? null,
        contentHash: hash,
        totalMinor: q.totalMinor,
      })
      .returning();
    const deposit = await issueInstalment(tx, { projectId: opts.projectId, kind: "deposit", now });
    return { acceptance, depositInvoiceId: deposit?.id ?? null };
  });
}

/** One version with its view, for the printable quote; null when there is no such quote. */
export async function getQuoteForPrint(quoteId: string) {
  const [q] = await db().select().from(quotes).where(eq(quotes.id, quoteId));
  if (!q) return null;
  const lines = await db().select().from(quoteLines).where(eq(quoteLines.quoteId, q.id)).orderBy(asc(quoteLines.position));
  const [acceptance] = await db().select().from(quoteAcceptances).where(eq(quoteAcceptances.quoteId, q.id));
  return { quote: q, acceptance: acceptance ?? null, ...(await quoteView(q, lines)) };
}
