import { composeEmail, type Email } from "./layout";
import { formatMoney } from "../money/amounts";

/** Sent to the client when an invoice is paid, by card or by a transfer the lead recorded. */
export function receiptEmail(opts: {
  companyName: string;
  recipientName: string;
  projectTitle: string;
  invoiceNumber: number;
  what: string;
  amountMinor: number;
  currency: string;
  method: "card" | "transfer";
  receivedOn: string;
  url: string;
}): Email {
  const amount = formatMoney(opts.amountMinor, opts.currency);
  return composeEmail({
    companyName: opts.companyName,
    subject: `Receipt: invoice ${opts.invoiceNumber} for ${opts.projectTitle} is paid`,
    greetingName: opts.recipientName,
    paragraphs: [
      `We received ${amount} ${opts.method === "card" ? "by card" : "by bank transfer"} on ${opts.receivedOn} for invoice ${opts.invoiceNumber} (${opts.what}, ${opts.projectTitle}).`,
      "Thank you. The invoice is marked paid; you can print it from the project's Money page.",
    ],
    link: { label: "See your invoices", url: opts.url },
  });
}
