import { sql } from "drizzle-orm";
import { bigint, date, index, integer, pgTable, text, timestamp, uniqueIndex, uuid, check } from "drizzle-orm/pg-core";
import { projects } from "./projects";
import { users } from "./users";
import { company } from "./company";
import { PRICE_BASES, QUOTE_GROUPS } from "../../lib/money/quote-lines";

// Amounts are integer minor units in the company's currency; rates basis points; quantities thousandths.
const minor = (name: string) => bigint(name, { mode: "number" });

/** The company's money settings: its one currency, the default schedule and terms. */
export const moneySettings = pgTable("money_settings", {
  companyId: integer("company_id")
    .primaryKey()
    .references(() => company.id),
  currency: text("currency").notNull().default("EUR"),
  depositBp: integer("deposit_bp").notNull().default(5000),
  progressBp: integer("progress_bp").notNull().default(3000),
  defaultTaxBp: integer("default_tax_bp").notNull().default(2000),
  paymentTermsDays: integer("payment_terms_days").notNull().default(14),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
});

/** The next invoice number per company: locked in the transaction that uses it, so numbers never skip or repeat. */
export const invoiceCounters = pgTable("invoice_counters", {
  companyId: integer("company_id")
    .primaryKey()
    .references(() => company.id),
  nextNumber: integer("next_number").notNull().default(1),
});

export const priceItems = pgTable("price_items", {
  id: uuid("id").primaryKey().defaultRandom(),
  group: text("group", { enum: QUOTE_GROUPS }).notNull(),
  label: text("label").notNull(),
  unit: text("unit").notNull(),
  unitPriceMinor: minor("unit_price_minor").notNull(),
  taxBp: integer("tax_bp").notNull(),
  basis: text("basis", { enum: PRICE_BASES }).notNull().default("manual"),
  panelThicknessMm: integer("panel_thickness_mm"),
  retiredAt: timestamp("retired_at", { withTimezone: true }),
  updatedBy: uuid("updated_by").references(() => users.id),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
});

/** A project's schedule: the company default copied on first use, then set per project by the lead. */
export const paymentSchedules = pgTable("payment_schedules", {
  projectId: uuid("project_id")
    .primaryKey()
    .references(() => projects.id),
  depositBp: integer("deposit_bp").notNull(),
  progressBp: integer("progress_bp").notNull(),
  /** The care plan's monthly amount (tax included); null when there is no plan. */
  monthlyPlanMinor: minor("monthly_plan_minor"),
  monthlyPlanTaxBp: integer("monthly_plan_tax_bp").notNull().default(0),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
});

export const quotes = pgTable(
  "quotes",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id),
    version: integer("version").notNull(),
    /** draft: the lead is still editing; current: the one the client sees; superseded: an earlier current. */
    status: text("status", { enum: ["draft", "current", "superseded"] }).notNull().default("draft"),
    currency: text("currency").notNull(),
    notes: text("notes").notNull().default(""),
    netMinor: minor("net_minor").notNull().default(0),
    taxMinor: minor("tax_minor").notNull().default(0),
    totalMinor: minor("total_minor").notNull().default(0),
    createdBy: uuid("created_by")
      .notNull()
      .references(() => users.id),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    issuedAt: timestamp("issued_at", { withTimezone: true }),
    supersededAt: timestamp("superseded_at", { withTimezone: true }),
  },
  (t) => [
    uniqueIndex("quotes_project_version_idx").on(t.projectId, t.version),
    uniqueIndex("quotes_one_current_idx").on(t.projectId).where(sql`status = 'current'`),
  ],
);

export const quoteLines = pgTable(
  "quote_lines",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    quoteId: uuid("quote_id")
      .notNull()
      .references(() => quotes.id),
    position: integer("position").notNull(),
    group: text("group", { enum: QUOTE_GROUPS }).notNull(),
    description: text("description").notNull(),
    unit: text("unit").notNull(),
    quantityMilli: bigint("quantity_milli", { mode: "number" }).notNull(),
    unitPriceMinor: minor("unit_price_minor").notNull(),
    discountBp: integer("discount_bp").notNull().default(0),
    taxBp: integer("tax_bp").notNull(),
    netMinor: minor("net_minor").notNull(),
    taxMinor: minor("tax_minor").notNull(),
    totalMinor: minor("total_minor").notNull(),
    priceItemId: uuid("price_item_id").references(() => priceItems.id),
  },
  (t) => [index("quote_lines_quote_idx").on(t.quoteId, t.position), check("quote_lines_not_negative", sql`quantity_milli >= 0 and unit_price_minor >= 0`)],
);

/** The client's acceptance of one quote version, with exactly what they saw. */
export const quoteAcceptances = pgTable("quote_acceptances", {
  id: uuid("id").primaryKey().defaultRandom(),
  quoteId: uuid("quote_id")
    .notNull()
    .unique()
    .references(() => quotes.id),
  projectId: uuid("project_id")
    .notNull()
    .references(() => projects.id),
  acceptedBy: uuid("accepted_by")
    .notNull()
    .references(() => users.id),
  typedName: text("typed_name").notNull(),
  acceptedAt: timestamp("accepted_at", { withTimezone: true }).notNull().defaultNow(),
  ipAddress: text("ip_address"),
  userAgent: text("user_agent"),
  /** SHA-256 of the quote's canonical text (lib/money/quote-view) as the client was shown it. */
  contentHash: text("content_hash").notNull(),
  totalMinor: minor("total_minor").notNull(),
});

export const invoices = pgTable(
  "invoices",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    number: integer("number").notNull().unique(),
    projectId: uuid("project_id")
      .notNull()
      .references(() => projects.id),
    quoteId: uuid("quote_id").references(() => quotes.id),
    kind: text("kind", { enum: ["deposit", "progress", "balance", "monthly"] }).notNull(),
    /** For monthly invoices, the month billed ("YYYY-MM"). */
    period: text("period"),
    currency: text("currency").notNull(),
    netMinor: minor("net_minor").notNull(),
    taxMinor: minor("tax_minor").notNull(),
    totalMinor: minor("total_minor").notNull(),
    status: text("status", { enum: ["open", "paid"] }).notNull().default("open"),
    issuedAt: timestamp("issued_at", { withTimezone: true }).notNull().defaultNow(),
    dueOn: date("due_on").notNull(),
    paidAt: timestamp("paid_at", { withTimezone: true }),
  },
  (t) => [
    index("invoices_project_idx").on(t.projectId),
    uniqueIndex("invoices_one_instalment_idx").on(t.projectId, t.kind).where(sql`kind <> 'monthly'`),
    uniqueIndex("invoices_one_month_idx").on(t.projectId, t.period).where(sql`kind = 'monthly'`),
    check("invoices_amounts", sql`total_minor >= 0 and tax_minor >= 0 and net_minor + tax_minor = total_minor`),
  ],
);

/** A card checkout started for an invoice at the payment service. */
export const cardCheckouts = pgTable("card_checkouts", {
  sessionId: text("session_id").primaryKey(),
  invoiceId: uuid("invoice_id")
    .notNull()
    .references(() => invoices.id),
  amountMinor: minor("amount_minor").notNull(),
  createdBy: uuid("created_by")
    .notNull()
    .references(() => users.id),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  /** open, completed or expired, as the payment service's webhooks say; completed never goes back. */
  status: text("status", { enum: ["open", "completed", "expired"] }).notNull().default("open"),
});

export const payments = pgTable(
  "payments",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    invoiceId: uuid("invoice_id")
      .notNull()
      .references(() => invoices.id),
    method: text("method", { enum: ["card", "transfer"] }).notNull(),
    amountMinor: minor("amount_minor").notNull(),
    /** The checkout session for a card payment; the bank reference for a transfer. */
    reference: text("reference").notNull(),
    receivedOn: date("received_on").notNull(),
    recordedBy: uuid("recorded_by").references(() => users.id),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("payments_invoice_idx").on(t.invoiceId), uniqueIndex("payments_card_session_idx").on(t.reference).where(sql`method = 'card'`)],
);

/** Every verified webhook event, by the payment service's id, so each is processed exactly once. */
export const paymentEvents = pgTable("payment_events", {
  id: text("id").primaryKey(),
  type: text("type").notNull(),
  receivedAt: timestamp("received_at", { withTimezone: true }).notNull().defaultNow(),
  invoiceId: uuid("invoice_id").references(() => invoices.id),
  outcome: text("outcome").notNull(),
});
