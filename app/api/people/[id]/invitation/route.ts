import { NextResponse } from "next/server";
import { route, parseId } from "@/server/route";
import { requireUser } from "@/server/session";
import { resendInvitation } from "@/db/queries/users";

/** Sends a fresh invitation link; earlier links stop working. */
export const POST = route<{ id: string }>(async (_req, ctx) => {
  const id = parseId((await ctx.params).id, "That person");
  const user = await requireUser("lead");
  const person = await resendInvitation(id, user.id);
  return NextResponse.json({ ok: true, name: person.name });
});
