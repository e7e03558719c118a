import { NextResponse } from "next/server";
import { userRoute } from "@/server/route";
import { timedSync } from "@/server/timing";
import { getBoard } from "@/db/queries/board";
import { createProject } from "@/db/queries/project-create";
import { projectCreateSchema } from "./project-create.schema";

export const dynamic = "force-dynamic";

/** The board: every card the caller may see, with what blocks each card's next stage. */
export const GET = userRoute({ roles: ["lead", "crew"] }, async ({ user }) => {
  const board = await getBoard(user);
  const body = timedSync("json", () => JSON.stringify(board));
  return new NextResponse(body, { headers: { "content-type": "application/json", "cache-control": "no-store" } });
});

/** A new project at the end of the site-survey column (lead only). */
export const POST = userRoute({ roles: ["lead"], schema: projectCreateSchema }, async ({ input, user }) => {
  const project = await createProject(input, user.id);
  // A new client was invited in the same step; the form says so.
  const invited = input.clientMode === "new" ? { name: input.clientName, email: input.clientEmail } : null;
  return NextResponse.json({ id: project.id, title: project.title, stage: project.stage, version: project.version, invited }, { status: 201 });
});
