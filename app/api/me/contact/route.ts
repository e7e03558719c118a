import { NextResponse } from "next/server";
import { parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { getContact, setContact } from "@/db/queries/notification-prefs";
import { contactSchema } from "./contact.schema";

export const GET = route(async () => {
  const user = await requireUser();
  return NextResponse.json({ contact: await getContact(user.id) });
});

/** The caller's own name and phone, shown to the others on their projects. */
export const PATCH = route(async (req) => {
  const input = await parseJson(req, contactSchema);
  const user = await requireUser();
  await setContact(user.id, { name: input.name, phone: input.phone || null });
  return NextResponse.json({ contact: await getContact(user.id) });
});
