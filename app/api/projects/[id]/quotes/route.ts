import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { createDraftQuote, getCurrentQuote, listQuotes } from "@/db/queries/quotes";
import { canOnProject } from "@/lib/auth/permissions";
import { newQuoteSchema } from "./quote.schema";

/** Everyone who may see money gets the current version and its hash; whoever manages money also gets every version. */
export const GET = projectRoute({ action: "see_money" }, async ({ project, relation }) => {
  const current = await getCurrentQuote(project.id);
  const shown = current && { view: current.view, hash: current.hash, acceptance: current.acceptance };
  if (!canOnProject(relation, "manage_money")) return NextResponse.json({ current: shown });
  return NextResponse.json({ versions: await listQuotes(project.id), current: shown });
});

/** Starts the next version as a draft, from the design and price list or from the current version. */
export const POST = projectRoute({ action: "manage_money", schema: newQuoteSchema }, async ({ input, project, user }) => {
  const quote = await createDraftQuote({ projectId: project.id, userId: user.id, from: input.from });
  return NextResponse.json({ quote }, { status: 201 });
});
