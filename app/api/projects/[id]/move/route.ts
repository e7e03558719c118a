import { NextResponse } from "next/server";
import { route, parseJson, type RouteContext } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { moveProject } from "@/db/queries/project-move";
import { moveSchema } from "./move.schema";

type Params = { id: string };

/** A card dropped on the board: 422 with reasons when a gate refuses, 409 when the card changed meanwhile. */
export const POST = route<Params>(async (req, { params }: RouteContext<Params>) => {
  const { id } = await params;
  const input = await parseJson(req, moveSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "move" });
  const result = await moveProject(project.id, input, user);
  return NextResponse.json(result);
});
