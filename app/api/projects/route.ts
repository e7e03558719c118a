import { NextResponse } from "next/server";
import { userRoute } from "@/server/route";
import { getBoard } from "@/db/queries/board";
import { createProject } from "@/db/queries/project-create";
import { projectCreateSchema } from "./project-create.schema";

export const dynamic = "force-dynamic";

/** The board: every card the caller may see, with what blocks each card's next stage. */
export const GET = userRoute({ roles: ["lead", "crew"] }, async ({ user }) => {
  return NextResponse.json(await getBoard(user), { headers: { "cache-control": "no-store" } });
});

/** A new project at the end of the site-survey column (lead only). */
export const POST = userRoute({ roles: ["lead"], schema: projectCreateSchema }, async ({ input, user }) => {
  const project = await createProject(input, user.id);
  return NextResponse.json({ id: project.id, title: project.title, stage: project.stage, version: project.version }, { status: 201 });
});
