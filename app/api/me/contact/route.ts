import { NextResponse } from "next/server";
import { userRoute } from "@/server/route";
import { getContact, setContact } from "@/db/queries/notification-prefs";
import { contactSchema } from "./contact.schema";

export const GET = userRoute({}, async ({ user }) => NextResponse.json({ contact: await getContact(user.id) }));

/** The caller's own name and phone, shown to the others on their projects. */
export const PATCH = userRoute({ schema: contactSchema }, async ({ input, user }) => {
  await setContact(user.id, { name: input.name, phone: input.phone || null });
  return NextResponse.json({ contact: await getContact(user.id) });
});
