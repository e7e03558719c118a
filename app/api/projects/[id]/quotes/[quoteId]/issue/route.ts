import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { issueQuote } from "@/db/queries/quotes";

type Params = { id: string; quoteId: string };

/** Makes the draft the current quote the client sees; the previous one is kept as superseded. */
export const POST = projectRoute<undefined, undefined, Params>({ action: "manage_money" }, async ({ project, params }) => {
  return NextResponse.json({ quote: await issueQuote({ projectId: project.id, quoteId: parseId(params.quoteId, "That quote") }) });
});
