import { NextResponse } from "next/server";
import { parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { listMessages, postMessage } from "@/db/queries/messages";
import { messageSchema } from "./message.schema";

type Params = { id: string };

export const GET = route<Params>(async (_req, { params }) => {
  const { id } = await params;
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "view" });
  return NextResponse.json({ messages: await listMessages(project.id) });
});

/** A message on the project; the other side is e-mailed through the outbox. */
export const POST = route<Params>(async (req, { params }) => {
  const { id } = await params;
  const input = await parseJson(req, messageSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "send_message" });
  const message = await postMessage({ project, author: user, body: input.body });
  return NextResponse.json({ id: message.id, body: message.body, createdAt: message.createdAt }, { status: 201 });
});
