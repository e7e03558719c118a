import { NextResponse } from "next/server";
import { publicRoute } from "@/server/route";
import { acceptInvitation } from "@/db/queries/users";
import { acceptInvitationSchema } from "./accept-invitation.schema";

/** Open to anyone holding a valid invitation token: the token is the credential, and works once. */
export const POST = publicRoute({ schema: acceptInvitationSchema }, async ({ input }) => {
  const user = await acceptInvitation(input.token, input.password);
  return NextResponse.json({ email: user.email });
});
