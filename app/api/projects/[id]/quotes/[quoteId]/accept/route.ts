import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { acceptQuote } from "@/db/queries/quotes";
import { acceptQuoteSchema } from "../../quote.schema";

type Params = { id: string; quoteId: string };

/** The first address a proxy saw, else the direct peer's, as the client's address. */
function clientAddress(req: Request): string | null {
  const fwd = req.headers.get("x-forwarded-for");
  if (fwd) return fwd.split(",")[0].trim().slice(0, 100);
  return req.headers.get("x-real-ip")?.slice(0, 100) ?? null;
}

/** The client accepts the current quote by typing their name; the deposit invoice follows. */
export const POST = projectRoute<typeof acceptQuoteSchema, undefined, Params>({ action: "accept_and_pay", schema: acceptQuoteSchema }, async ({ req, input, project, user, params }) => {
  const result = await acceptQuote({
    projectId: project.id,
    quoteId: parseId(params.quoteId, "That quote"),
    user,
    typedName: input.typedName,
    seenHash: input.seenHash,
    ipAddress: clientAddress(req),
    userAgent: req.headers.get("user-agent"),
  });
  return NextResponse.json(result, { status: 201 });
});
