import { NextResponse } from "next/server";
import { route, parseJson } from "@/server/route";
import { requireUser } from "@/server/session";
import { addPriceItem, listPriceItems } from "@/db/queries/money-settings";
import { priceItemSchema } from "./price-item.schema";

/** The company's price list, retired items included. Lead only. */
export const GET = route(async () => {
  await requireUser("lead");
  return NextResponse.json({ items: await listPriceItems({ includeRetired: true }) });
});

export const POST = route(async (req) => {
  const input = await parseJson(req, priceItemSchema);
  const user = await requireUser("lead");
  return NextResponse.json({ item: await addPriceItem(input, user.id) }, { status: 201 });
});
