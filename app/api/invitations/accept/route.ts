import { NextResponse } from "next/server";
import { route, parseJson } from "@/server/route";
import { acceptInvitation } from "@/db/queries/users";
import { acceptInvitationSchema } from "@/app/(auth)/invitation/[token]/accept-invitation.schema";

/** Open to anyone holding a valid invitation token: the token is the credential, and works once. */
export const POST = route(async (req) => {
  const input = await parseJson(req, acceptInvitationSchema);
  const user = await acceptInvitation(input.token, input.password);
  return NextResponse.json({ email: user.email });
});
