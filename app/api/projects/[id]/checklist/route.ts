import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { listChecklistItems, listProjectTicks } from "@/db/queries/checklists";
import { latestTicks, stageProgress } from "@/lib/install/checklist-progress";
import { STAGES } from "@/lib/stages/stages";

/** The company's items and this project's state of each: the newest tick by seq. */
export const GET = projectRoute({ action: "view_internal" }, async ({ project }) => {
  const [items, ticks] = await Promise.all([listChecklistItems(), listProjectTicks(project.id)]);
  const latest = latestTicks(ticks);
  return NextResponse.json({
    items: items.map((i) => ({ ...i, state: latest.get(i.id) ?? null })),
    progress: stageProgress(STAGES, items, ticks).filter((p) => p.total > 0),
  });
});
