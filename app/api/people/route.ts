import { NextResponse } from "next/server";
import { userRoute } from "@/server/route";
import { inviteUser, listPeople } from "@/db/queries/users";
import { inviteSchema } from "./invite.schema";

export const GET = userRoute({ roles: ["lead"] }, async () => NextResponse.json({ people: await listPeople() }));

/** Adds a crew member or client and queues their invitation e-mail. */
export const POST = userRoute({ roles: ["lead"], schema: inviteSchema }, async ({ input, user }) => {
  const created = await inviteUser({ ...input, phone: input.phone || null }, user.id);
  return NextResponse.json({ id: created.id, name: created.name, email: created.email, role: created.role }, { status: 201 });
});
