import "server-only";
import { parseId } from "@/server/route";
import { notFound } from "@/server/errors";
import { requireProject } from "@/db/queries/project-access";
import { getInvoice } from "@/db/queries/invoices";
import type { ProjectAction } from "@/lib/auth/permissions";
import type { SessionUser } from "@/server/session";

/** The invoice and its project, checked like the project itself: 404 when the caller can't see it. */
export async function requireInvoice(invoiceId: string, user: SessionUser, action: ProjectAction) {
  const invoice = await getInvoice(parseId(invoiceId, "That invoice"));
  if (!invoice) throw notFound("That invoice");
  const { project } = await requireProject({ projectId: invoice.projectId, user, action });
  return { invoice, project };
}
