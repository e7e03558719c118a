import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { listInvoicePayments, listProjectInvoices } from "@/db/queries/invoices";

/** The project's invoices and the payments against them: the lead, and the project's own client. */
export const GET = projectRoute({ action: "see_money" }, async ({ project }) => {
  const invoices = await listProjectInvoices(project.id);
  const payments = await listInvoicePayments(invoices.map((i) => i.id));
  return NextResponse.json({ invoices, payments });
});
