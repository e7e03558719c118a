import { NextResponse } from "next/server";
import { userRoute } from "@/server/route";
import { addPriceItem, listPriceItems } from "@/db/queries/money-settings";
import { priceItemSchema } from "./price-item.schema";

/** The company's price list, retired items included. Lead only. */
export const GET = userRoute({ roles: ["lead"] }, async () => {
  return NextResponse.json({ items: await listPriceItems({ includeRetired: true }) });
});

export const POST = userRoute({ roles: ["lead"], schema: priceItemSchema }, async ({ input, user }) => {
  return NextResponse.json({ item: await addPriceItem(input, user.id) }, { status: 201 });
});
