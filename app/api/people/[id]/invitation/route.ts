import { NextResponse } from "next/server";
import { parseId, userRoute } from "@/server/route";
import { resendInvitation } from "@/db/queries/users";

/** Sends a fresh invitation link; earlier links stop working. */
export const POST = userRoute<undefined, undefined, { id: string }>({ roles: ["lead"] }, async ({ user, params }) => {
  const person = await resendInvitation(parseId(params.id, "That person"), user.id);
  return NextResponse.json({ ok: true, name: person.name });
});
