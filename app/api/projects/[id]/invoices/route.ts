import { NextResponse } from "next/server";
import { route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { listInvoicePayments, listProjectInvoices } from "@/db/queries/invoices";

type Params = { id: string };

/** The project's invoices and the payments against them: the lead, and the project's own client. */
export const GET = route<Params>(async (_req, ctx) => {
  const { id } = await ctx.params;
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "see_money" });
  const invoices = await listProjectInvoices(project.id);
  const payments = await listInvoicePayments(invoices.map((i) => i.id));
  return NextResponse.json({ invoices, payments });
});
