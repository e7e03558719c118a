import { stageIndex, type Stage } from "../stages/stages";
import { AmountError, BASIS_POINTS, splitByWeights } from "./amounts";

/**
 * The payment schedule: a deposit when the client accepts the quote, a progress payment on install
 * day, the balance at handover, and a plan billed monthly once the tank is in service.
 */
export const INSTALMENTS = ["deposit", "progress", "balance"] as const;
export type Instalment = (typeof INSTALMENTS)[number];
export type InvoiceKind = Instalment | "monthly";

export const INVOICE_KIND_LABELS: Record<InvoiceKind, string> = {
  deposit: "Deposit",
  progress: "Install-day payment",
  balance: "Balance at handover",
  monthly: "Monthly care plan",
};

/** Install day starts when the crew begins the build: the move into aquascape. */
export const INSTALL_DAY_STAGE: Stage = "aquascape";
export const HANDOVER_STAGE: Stage = "in_service";

/** Shares of the accepted total, in basis points; the balance is whatever is left. */
export type ScheduleShares = { depositBp: number; progressBp: number };

export function checkShares(s: ScheduleShares): string | null {
  if (![s.depositBp, s.progressBp].every((v) => Number.isSafeInteger(v) && v >= 0)) return "Shares are whole basis points, not negative.";
  if (s.depositBp + s.progressBp > BASIS_POINTS) return "The deposit and the install-day payment together can't be more than 100 %.";
  return null;
}

/** The three instalments of `total`, adding up to it exactly (largest-remainder split). */
export function splitSchedule(total: number, s: ScheduleShares): Record<Instalment, number> {
  const problem = checkShares(s);
  if (problem) throw new AmountError(problem);
  const balanceBp = BASIS_POINTS - s.depositBp - s.progressBp;
  const [deposit, progress, balance] = splitByWeights(total, [s.depositBp, s.progressBp, balanceBp]);
  return { deposit, progress, balance };
}

/**
 * What the next instalment bills: deposit and progress are their share of the split; the balance
 * is the accepted total less everything already billed on it, so a change of shares or quote
 * between instalments can never lose or add a minor unit.
 */
export function instalmentAmount(kind: Instalment, total: number, s: ScheduleShares, alreadyBilled: number): number {
  const planned = splitSchedule(total, s);
  const amount = kind === "balance" ? total - alreadyBilled : Math.min(planned[kind], Math.max(0, total - alreadyBilled));
  return Math.max(0, amount);
}

/** The instalments a move from `from` to `to` makes due (moving back makes none due). */
export function instalmentsDueOnMove(from: Stage, to: Stage): Instalment[] {
  const a = stageIndex(from);
  const b = stageIndex(to);
  const out: Instalment[] = [];
  if (a < stageIndex(INSTALL_DAY_STAGE) && b >= stageIndex(INSTALL_DAY_STAGE)) out.push("progress");
  if (a < stageIndex(HANDOVER_STAGE) && b >= stageIndex(HANDOVER_STAGE)) out.push("balance");
  return out;
}

/** A calendar month as "YYYY-MM", the period a monthly invoice covers. */
export function monthPeriod(d: Date): string {
  return d.toISOString().slice(0, 7);
}

export function isPeriod(text: string): boolean {
  return /^\d{4}-(0[1-9]|1[0-2])$/.test(text);
}

/** Whether an unpaid invoice is past its due date (dates as "YYYY-MM-DD"). */
export function isOverdue(inv: { status: string; dueOn: string }, today: string): boolean {
  return inv.status === "open" && inv.dueOn < today;
}
