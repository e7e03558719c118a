import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { acceptQuote } from "@/db/queries/quotes";
import { acceptQuoteSchema } from "../../quote.schema";

type Params = { id: string; quoteId: string };

/**
 * Where the acceptance came from: the whole forwarding chain as received (Next fills in the peer's
 * address when no proxy set one), since which entry is trustworthy depends on the proxies in front.
 */
function clientAddress(req: Request): string | null {
  const chain = req.headers.get("x-forwarded-for") ?? req.headers.get("x-real-ip");
  return chain ? chain.trim().slice(0, 300) : null;
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
