import { NextResponse } from "next/server";
import { route, parseJson, parseId } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { saveDraftQuote } from "@/db/queries/quotes";
import { saveQuoteSchema } from "../quote.schema";

type Params = { id: string; quoteId: string };

/** Replaces a draft's lines and notes; totals are worked out on the server. */
export const PUT = route<Params>(async (req, ctx) => {
  const { id, quoteId } = await ctx.params;
  const input = await parseJson(req, saveQuoteSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "manage_money" });
  const totals = await saveDraftQuote({ projectId: project.id, quoteId: parseId(quoteId, "That quote"), lines: input.lines, notes: input.notes });
  return NextResponse.json({ netMinor: totals.netMinor, taxMinor: totals.taxMinor, totalMinor: totals.totalMinor });
});
