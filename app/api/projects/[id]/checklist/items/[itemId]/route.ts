import { NextResponse } from "next/server";
import { parseId, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { getChecklistItem, listItemTicks } from "@/db/queries/checklists";
import { notFound } from "@/server/errors";

/** One item's history on the project, newest first: every tick and untick with who, when and why. */
export const GET = route<{ id: string; itemId: string }>(async (_req, { params }) => {
  const p = await params;
  const user = await requireUser("lead", "crew");
  const { project } = await requireProject({ projectId: p.id, user, action: "tick_checklist" });
  const item = await getChecklistItem(parseId(p.itemId, "That checklist item"));
  if (!item) throw notFound("That checklist item");
  return NextResponse.json({ item, history: await listItemTicks(project.id, item.id) });
});
