import { NextResponse } from "next/server";
import { route, parseJson } from "@/server/route";
import { requireUser } from "@/server/session";
import { recordTransfer } from "@/db/queries/payments";
import { requireInvoice } from "../invoice-access";
import { transferSchema } from "./transfer.schema";

type Params = { invoiceId: string };

/** The lead records a bank transfer received for an invoice; the client gets a receipt. */
export const POST = route<Params>(async (req, ctx) => {
  const { invoiceId } = await ctx.params;
  const input = await parseJson(req, transferSchema);
  const user = await requireUser();
  const { invoice } = await requireInvoice(invoiceId, user, "manage_money");
  return NextResponse.json(await recordTransfer({ invoiceId: invoice.id, userId: user.id, ...input }), { status: 201 });
});
