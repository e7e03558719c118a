import { NextResponse } from "next/server";
import { parseId, parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { updateChecklistItem } from "@/db/queries/checklists";
import { editChecklistItemSchema } from "../checklist-item.schema";

/** Edits, moves or retires an item (lead only). Items are never deleted: ticks refer to them. */
export const PATCH = route<{ id: string }>(async (req, { params }) => {
  const input = await parseJson(req, editChecklistItemSchema);
  await requireUser("lead");
  const id = parseId((await params).id, "That checklist item");
  const item = await updateChecklistItem(id, input);
  return NextResponse.json({ item });
});
