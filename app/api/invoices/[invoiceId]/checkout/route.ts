import { NextResponse } from "next/server";
import { route } from "@/server/route";
import { requireUser } from "@/server/session";
import { env } from "@/env";
import { startCardCheckout } from "@/db/queries/payments";
import { requireInvoice } from "../invoice-access";

type Params = { invoiceId: string };

/** The client starts paying one of their own open invoices by card; answers the payment page's address. */
export const POST = route<Params>(async (_req, ctx) => {
  const { invoiceId } = await ctx.params;
  const user = await requireUser();
  const { invoice, project } = await requireInvoice(invoiceId, user, "accept_and_pay");
  const { url } = await startCardCheckout({ invoice, projectTitle: project.title, userId: user.id, returnUrl: `${env().APP_URL}/projects/${project.id}/money` });
  return NextResponse.json({ url }, { status: 201 });
});
