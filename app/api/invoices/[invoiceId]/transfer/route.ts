import { NextResponse } from "next/server";
import { userRoute } from "@/server/route";
import { recordTransfer } from "@/db/queries/payments";
import { requireInvoice } from "../invoice-access";
import { transferSchema } from "./transfer.schema";

/** The lead records a bank transfer received for an invoice; the client gets a receipt. */
export const POST = userRoute<typeof transferSchema, undefined, { invoiceId: string }>({ schema: transferSchema }, async ({ input, user, params }) => {
  const { invoice } = await requireInvoice(params.invoiceId, user, "manage_money");
  return NextResponse.json(await recordTransfer({ invoiceId: invoice.id, userId: user.id, ...input }), { status: 201 });
});
