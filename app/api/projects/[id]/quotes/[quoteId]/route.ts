import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { saveDraftQuote } from "@/db/queries/quotes";
import { saveQuoteSchema } from "../quote.schema";

type Params = { id: string; quoteId: string };

/** Replaces a draft's lines and notes; totals are worked out on the server. */
export const PUT = projectRoute<typeof saveQuoteSchema, undefined, Params>({ action: "manage_money", schema: saveQuoteSchema }, async ({ input, project, params }) => {
  const totals = await saveDraftQuote({ projectId: project.id, quoteId: parseId(params.quoteId, "That quote"), lines: input.lines, notes: input.notes });
  return NextResponse.json({ netMinor: totals.netMinor, taxMinor: totals.taxMinor, totalMinor: totals.totalMinor });
});
