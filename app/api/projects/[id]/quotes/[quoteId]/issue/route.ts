import { NextResponse } from "next/server";
import { route, parseId } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { issueQuote } from "@/db/queries/quotes";

type Params = { id: string; quoteId: string };

/** Makes the draft the current quote the client sees; the previous one is kept as superseded. */
export const POST = route<Params>(async (_req, ctx) => {
  const { id, quoteId } = await ctx.params;
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "manage_money" });
  return NextResponse.json({ quote: await issueQuote({ projectId: project.id, quoteId: parseId(quoteId, "That quote") }) });
});
