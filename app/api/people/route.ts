import { NextResponse } from "next/server";
import { route, parseJson } from "@/server/route";
import { requireUser } from "@/server/session";
import { inviteUser, listPeople } from "@/db/queries/users";
import { inviteSchema } from "@/app/(app)/people/invite.schema";

export const GET = route(async () => {
  await requireUser("lead");
  return NextResponse.json({ people: await listPeople() });
});

/** Adds a crew member or client and queues their invitation e-mail. */
export const POST = route(async (req) => {
  const input = await parseJson(req, inviteSchema);
  const user = await requireUser("lead");
  const created = await inviteUser({ ...input, phone: input.phone || null }, user.id);
  return NextResponse.json({ id: created.id, name: created.name, email: created.email, role: created.role }, { status: 201 });
});
