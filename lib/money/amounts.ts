/**
 * Money arithmetic. Every amount is an integer number of minor units (cents, pence…) in the
 * company's one currency; quantities are integer thousandths; rates are basis points (1 % = 100).
 *
 * The rounding rule, "per line, half away from zero": each line's net (quantity × unit price, less
 * its discount) is rounded once to the minor unit, then its tax (net × rate) is rounded once. The
 * quote's totals are plain sums of those rounded line figures, so the lines always add up to the total.
 * Intermediate products use BigInt, so nothing is lost to floating point before the one rounding.
 */

/** Largest amount accepted anywhere (10¹² minor units): far above any install, far below 2⁵³. */
export const MAX_AMOUNT_MINOR = 1_000_000_000_000;
/** Largest unit price: 10¹⁰ minor units. */
export const MAX_UNIT_PRICE_MINOR = 10_000_000_000;
/** Largest quantity: one million (in thousandths: 10⁹). */
export const MAX_QUANTITY_MILLI = 1_000_000_000;
export const BASIS_POINTS = 10_000;

/** n ÷ d rounded half away from zero, exactly, for BigInt n and d > 0. */
export function divRoundHalfAway(n: bigint, d: bigint): bigint {
  if (d <= BigInt(0)) throw new Error("divisor must be positive");
  // Stryker disable next-line EqualityOperator: at n = 0 both signs give 0n (BigInt has no negative zero)
  const neg = n < BigInt(0);
  const a = neg ? -n : n;
  const q = (a * BigInt(2) + d) / (d * BigInt(2));
  return neg ? -q : q;
}

export type LineInput = {
  /** Quantity in thousandths (2.5 m² → 2500). */
  quantityMilli: number;
  unitPriceMinor: number;
  /** Discount on this line, basis points (10 % → 1000). */
  discountBp: number;
  /** Tax rate on this line, basis points (20 % → 2000). */
  taxBp: number;
};

export type LineAmounts = { netMinor: number; taxMinor: number; totalMinor: number };

export class AmountError extends Error {}

function checkLine(line: LineInput) {
  const ints = [line.quantityMilli, line.unitPriceMinor, line.discountBp, line.taxBp];
  if (!ints.every(Number.isSafeInteger)) throw new AmountError("Quantities, prices and rates must be whole numbers of their units.");
  if (line.quantityMilli < 0 || line.unitPriceMinor < 0) throw new AmountError("Quantities and prices can't be negative.");
  if (line.quantityMilli > MAX_QUANTITY_MILLI) throw new AmountError("That quantity is too large.");
  if (line.unitPriceMinor > MAX_UNIT_PRICE_MINOR) throw new AmountError("That unit price is too large.");
  if (line.discountBp < 0 || line.discountBp > BASIS_POINTS) throw new AmountError("A discount is between 0 % and 100 %.");
  if (line.taxBp < 0 || line.taxBp > BASIS_POINTS) throw new AmountError("A tax rate is between 0 % and 100 %.");
}

/** One line's net, tax and total, by the per-line half-away-from-zero rule. */
export function lineAmounts(line: LineInput): LineAmounts {
  checkLine(line);
  const gross = BigInt(line.quantityMilli) * BigInt(line.unitPriceMinor) * BigInt(BASIS_POINTS - line.discountBp);
  const net = divRoundHalfAway(gross, BigInt(1000 * BASIS_POINTS));
  const tax = divRoundHalfAway(net * BigInt(line.taxBp), BigInt(BASIS_POINTS));
  if (net + tax > BigInt(MAX_AMOUNT_MINOR)) throw new AmountError("That line's amount is too large to bill.");
  return { netMinor: Number(net), taxMinor: Number(tax), totalMinor: Number(net + tax) };
}

export type Totals = LineAmounts & { lines: LineAmounts[] };

/** A quote's totals: the sums of its rounded lines. */
export function quoteTotals(lines: LineInput[]): Totals {
  const each = lines.map(lineAmounts);
  const netMinor = each.reduce((s, l) => s + l.netMinor, 0);
  const taxMinor = each.reduce((s, l) => s + l.taxMinor, 0);
  if (netMinor + taxMinor > MAX_AMOUNT_MINOR) throw new AmountError("The quote's total is too large to bill.");
  return { netMinor, taxMinor, totalMinor: netMinor + taxMinor, lines: each };
}

/**
 * Splits `total` into parts proportional to `weights` (basis points or any non-negative integers)
 * by the largest-remainder method: each part is rounded down, then the minor units left over go
 * one each to the parts with the largest remainders (earlier parts first on a tie). The parts
 * always add up to exactly `total`.
 */
export function splitByWeights(total: number, weights: number[]): number[] {
  if (!Number.isSafeInteger(total) || total < 0) throw new AmountError("Only a whole, non-negative amount can be split.");
  if (!weights.length || weights.some((w) => !Number.isSafeInteger(w) || w < 0)) throw new AmountError("Split weights must be whole and non-negative.");
  const sum = weights.reduce((s, w) => s + w, 0);
  if (sum === 0) throw new AmountError("At least one part of a split must be above zero.");
  const T = BigInt(total);
  const S = BigInt(sum);
  const floors = weights.map((w) => (T * BigInt(w)) / S);
  const rems = weights.map((w, i) => ({ i, r: T * BigInt(w) - floors[i] * S }));
  let left = Number(T - floors.reduce((s, f) => s + f, BigInt(0)));
  // Ties keep the earlier part first: the sort is stable and rems is built in index order.
  rems.sort(largerRemainderFirst);
  const parts = floors.map(Number);
  for (const { i } of rems) {
    if (left <= 0) break;
    parts[i] += 1;
    left -= 1;
  }
  return parts;
}

function largerRemainderFirst(a: { r: bigint }, b: { r: bigint }): number {
  if (a.r > b.r) return -1;
  // Stryker disable next-line ConditionalExpression,EqualityOperator: Node's sort moves a part ahead only on a −1 (above), so 1 and 0 here order alike
  if (a.r < b.r) return 1;
  return 0;
}

/** Major-unit text ("12.50") to minor units; null when it isn't a plain non-negative amount. */
export function parseMajor(text: string, decimals = 2): number | null {
  const t = text.trim();
  const m = new RegExp(`^(\\d{1,13})(?:\\.(\\d{1,${decimals}}))?$`).exec(t);
  if (!m) return null;
  const minor = Number(m[1]) * 10 ** decimals + Number((m[2] ?? "").padEnd(decimals, "0") || 0);
  return Number.isSafeInteger(minor) ? minor : null;
}

/** Minor units as "1,234.50 EUR"-style text in a fixed, locale-independent form. */
export function formatMoney(minor: number, currency: string, decimals = 2): string {
  const neg = minor < 0;
  const a = Math.abs(minor);
  const major = Math.floor(a / 10 ** decimals);
  const frac = decimals ? "." + String(a % 10 ** decimals).padStart(decimals, "0") : "";
  const grouped = String(major).replace(/\B(?=(\d{3})+(?!\d))/g, ",");
  return `${neg ? "−" : ""}${grouped}${frac} ${currency}`;
}

/** Basis points as "12.5 %". */
export function formatRate(bp: number): string {
  return `${Number((bp / 100).toFixed(2))} %`;
}

/** Thousandths as a plain quantity ("2.345", "3"). */
export function formatQuantity(milli: number): string {
  return String(Number((milli / 1000).toFixed(3)));
}
