import { NextResponse } from "next/server";
import { parseId, userRoute } from "@/server/route";
import { updateChecklistItem } from "@/db/queries/checklists";
import { editChecklistItemSchema } from "../checklist-item.schema";

/** Edits, moves or retires an item (lead only). Items are never deleted: ticks refer to them. */
export const PATCH = userRoute<typeof editChecklistItemSchema, undefined, { id: string }>(
  { roles: ["lead"], schema: editChecklistItemSchema },
  async ({ input, params }) => {
    const item = await updateChecklistItem(parseId(params.id, "That checklist item"), input);
    return NextResponse.json({ item });
  },
);
