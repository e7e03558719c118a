import { NextResponse } from "next/server";
import { z } from "zod";
import { userRoute } from "@/server/route";
import { createChecklistItem, listChecklistItems } from "@/db/queries/checklists";
import { newChecklistItemSchema } from "./checklist-item.schema";

const listQuery = z.object({ retired: z.enum(["0", "1"]).optional() });

export const GET = userRoute({ roles: ["lead", "crew"], query: listQuery }, async ({ query }) => {
  return NextResponse.json({ items: await listChecklistItems({ includeRetired: query.retired === "1" }) });
});

/** Adds an item at the end of its stage's list. */
export const POST = userRoute({ roles: ["lead"], schema: newChecklistItemSchema }, async ({ input }) => {
  const item = await createChecklistItem({ ...input, hint: input.hint ?? null });
  return NextResponse.json({ item }, { status: 201 });
});
