import { NextResponse } from "next/server";
import { route, parseJson } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { createDraftQuote, getCurrentQuote, listQuotes } from "@/db/queries/quotes";
import { newQuoteSchema } from "./quote.schema";

type Params = { id: string };

/** The lead gets every version; the client only the current one, with the hash of what they see. */
export const GET = route<Params>(async (_req, ctx) => {
  const { id } = await ctx.params;
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "see_money" });
  const current = await getCurrentQuote(project.id);
  if (user.role !== "lead") return NextResponse.json({ current: current && { view: current.view, hash: current.hash, acceptance: current.acceptance } });
  return NextResponse.json({ versions: await listQuotes(project.id), current: current && { view: current.view, hash: current.hash, acceptance: current.acceptance } });
});

/** Starts the next version as a draft, from the design and price list or from the current version. */
export const POST = route<Params>(async (req, ctx) => {
  const { id } = await ctx.params;
  const input = await parseJson(req, newQuoteSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "manage_money" });
  const quote = await createDraftQuote({ projectId: project.id, userId: user.id, from: input.from });
  return NextResponse.json({ quote }, { status: 201 });
});
