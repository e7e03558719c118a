import { NextResponse } from "next/server";
import { parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { createChecklistItem, listChecklistItems } from "@/db/queries/checklists";
import { newChecklistItemSchema } from "./checklist-item.schema";

export const GET = route(async (req) => {
  await requireUser("lead", "crew");
  const includeRetired = new URL(req.url).searchParams.get("retired") === "1";
  return NextResponse.json({ items: await listChecklistItems({ includeRetired }) });
});

/** Adds an item at the end of its stage's list. */
export const POST = route(async (req) => {
  const input = await parseJson(req, newChecklistItemSchema);
  await requireUser("lead");
  const item = await createChecklistItem({ ...input, hint: input.hint ?? null });
  return NextResponse.json({ item }, { status: 201 });
});
