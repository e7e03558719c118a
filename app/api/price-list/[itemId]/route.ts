import { NextResponse } from "next/server";
import { parseId, userRoute } from "@/server/route";
import { notFound } from "@/server/errors";
import { updatePriceItem } from "@/db/queries/money-settings";
import { priceItemPatchSchema } from "../price-item.schema";

/** Changes an item's price or wording, or retires it (it is never deleted). Lead only. */
export const PATCH = userRoute<typeof priceItemPatchSchema, undefined, { itemId: string }>({ roles: ["lead"], schema: priceItemPatchSchema }, async ({ input, user, params }) => {
  const item = await updatePriceItem(parseId(params.itemId, "That price-list item"), input, user.id);
  if (!item) throw notFound("That price-list item");
  return NextResponse.json({ item });
});
