import "server-only";
import { parseId, projectFor } from "@/server/route";
import { notFound } from "@/server/errors";
import { getInvoice } from "@/db/queries/invoices";
import type { ProjectAction } from "@/lib/auth/permissions";
import type { SessionUser } from "@/server/session";

/** The invoice and its project, checked like the project itself: 404 when the caller can't see it, then 403. */
export async function requireInvoice(invoiceId: string, user: SessionUser, action: ProjectAction) {
  const invoice = await getInvoice(parseId(invoiceId, "That invoice"));
  if (!invoice) throw notFound("That invoice");
  const { project } = await projectFor(invoice.projectId, user, action, "That invoice");
  return { invoice, project };
}
