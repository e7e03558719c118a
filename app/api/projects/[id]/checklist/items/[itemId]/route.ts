import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { getChecklistItem, listItemTicks } from "@/db/queries/checklists";
import { notFound } from "@/server/errors";

/** One item's history on the project, newest first: every tick and untick with who, when and why. */
export const GET = projectRoute<undefined, undefined, { id: string; itemId: string }>({ action: "view_internal" }, async ({ project, params }) => {
  const item = await getChecklistItem(parseId(params.itemId, "That checklist item"));
  if (!item) throw notFound("That checklist item");
  return NextResponse.json({ item, history: await listItemTicks(project.id, item.id) });
});
