import { NextResponse } from "next/server";
import { route, parseJson, parseId } from "@/server/route";
import { requireUser } from "@/server/session";
import { notFound } from "@/server/errors";
import { updatePriceItem } from "@/db/queries/money-settings";
import { priceItemPatchSchema } from "../price-item.schema";

/** Changes an item's price or wording, or retires it (it is never deleted). Lead only. */
export const PATCH = route<{ itemId: string }>(async (req, ctx) => {
  const { itemId } = await ctx.params;
  const input = await parseJson(req, priceItemPatchSchema);
  const user = await requireUser("lead");
  const item = await updatePriceItem(parseId(itemId, "That price-list item"), input, user.id);
  if (!item) throw notFound("That price-list item");
  return NextResponse.json({ item });
});
