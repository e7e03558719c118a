import { NextResponse } from "next/server";
import { route, parseJson } from "@/server/route";
import { requireUser } from "@/server/session";
import { getBoard } from "@/db/queries/board";
import { createProject } from "@/db/queries/project-create";
import { projectCreateSchema } from "./project-create.schema";

export const dynamic = "force-dynamic";

/** The board: every card the caller may see, with what blocks each card's next stage. */
export const GET = route(async () => {
  const user = await requireUser("lead", "crew");
  return NextResponse.json(await getBoard(user), { headers: { "cache-control": "no-store" } });
});

/** A new project at the end of the site-survey column (lead only). */
export const POST = route(async (req) => {
  const input = await parseJson(req, projectCreateSchema);
  const user = await requireUser("lead");
  const project = await createProject(input, user.id);
  // A new client was invited in the same step; the form says so.
  const invited = input.clientMode === "new" ? { name: input.clientName, email: input.clientEmail } : null;
  return NextResponse.json({ id: project.id, title: project.title, stage: project.stage, version: project.version, invited }, { status: 201 });
});
