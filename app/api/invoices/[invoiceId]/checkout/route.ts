import { NextResponse } from "next/server";
import { userRoute } from "@/server/route";
import { env } from "@/env";
import { startCardCheckout } from "@/db/queries/payments";
import { requireInvoice } from "../invoice-access";

/** The client starts paying one of their own open invoices by card; answers the payment page's address. */
export const POST = userRoute<undefined, undefined, { invoiceId: string }>({}, async ({ user, params }) => {
  const { invoice, project } = await requireInvoice(params.invoiceId, user, "accept_and_pay");
  const { url } = await startCardCheckout({ invoice, projectTitle: project.title, userId: user.id, returnUrl: `${env().APP_URL}/projects/${project.id}/money` });
  return NextResponse.json({ url }, { status: 201 });
});
