import { QUOTE_GROUPS, QUOTE_GROUP_LABELS, type QuoteGroup } from "./quote-lines";

/** Exactly what a client is shown of a quote: the accept button's hash is taken over this. */
export type QuoteView = {
  quoteId: string;
  projectTitle: string;
  companyName: string;
  version: number;
  currency: string;
  issuedAt: string | null;
  notes: string;
  lines: {
    group: QuoteGroup;
    description: string;
    unit: string;
    quantityMilli: number;
    unitPriceMinor: number;
    discountBp: number;
    taxBp: number;
    netMinor: number;
    taxMinor: number;
    totalMinor: number;
  }[];
  netMinor: number;
  taxMinor: number;
  totalMinor: number;
};

/**
 * A stable text of the view (keys in a fixed order, lines in their shown order), so the same
 * quote always hashes the same and any change to a figure or word changes the hash.
 */
export function canonicalQuoteText(v: QuoteView): string {
  return JSON.stringify([
    v.quoteId,
    v.companyName,
    v.projectTitle,
    v.version,
    v.currency,
    v.issuedAt,
    v.notes,
    v.lines.map((l) => [l.group, l.description, l.unit, l.quantityMilli, l.unitPriceMinor, l.discountBp, l.taxBp, l.netMinor, l.taxMinor, l.totalMinor]),
    v.netMinor,
    v.taxMinor,
    v.totalMinor,
  ]);
}

/** Lines in their groups, in the groups' order, skipping empty groups. */
export function groupLines<L extends { group: QuoteGroup }>(lines: L[]): { group: QuoteGroup; label: string; lines: L[] }[] {
  return QUOTE_GROUPS.map((g) => ({ group: g, label: QUOTE_GROUP_LABELS[g], lines: lines.filter((l) => l.group === g) })).filter((g) => g.lines.length);
}
