import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { listMessages, postMessage } from "@/db/queries/messages";
import { messageSchema } from "./message.schema";

export const GET = projectRoute({ action: "view" }, async ({ project }) => NextResponse.json({ messages: await listMessages(project.id) }));

/** A message on the project; the other side is e-mailed through the outbox. */
export const POST = projectRoute({ action: "send_message", schema: messageSchema }, async ({ input, project, user }) => {
  const message = await postMessage({ project, author: user, body: input.body });
  return NextResponse.json({ id: message.id, body: message.body, createdAt: message.createdAt }, { status: 201 });
});
