import { NextResponse } from "next/server";
import { route, parseJson, parseId } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
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
export const POST = route<Params>(async (req, ctx) => {
  const { id, quoteId } = await ctx.params;
  const input = await parseJson(req, acceptQuoteSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "accept_and_pay" });
  const result = await acceptQuote({
    projectId: project.id,
    quoteId: parseId(quoteId, "That quote"),
    user,
    typedName: input.typedName,
    seenHash: input.seenHash,
    ipAddress: clientAddress(req),
    userAgent: req.headers.get("user-agent"),
  });
  return NextResponse.json(result, { status: 201 });
});
