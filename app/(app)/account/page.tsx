import type { Metadata } from "next";
import { requirePageUser } from "@/server/session";
import { getContact, getPrefs } from "@/db/queries/notification-prefs";
import { getCalendarToken } from "@/db/queries/visits";
import { env } from "@/env";
import { PrefsForm } from "./_components/prefs-form";
import { ContactForm } from "./_components/contact-form";
import { CalendarFeed } from "./_components/calendar-feed";

export const metadata: Metadata = { title: "Account" };
export const dynamic = "force-dynamic";

export default async function AccountPage() {
  const user = await requirePageUser();
  const [prefs, contact, token] = await Promise.all([getPrefs(user.id), getContact(user.id), getCalendarToken(user.id)]);
  // Cycle-ready e-mails go to staff and clients alike; every role sees every kind.
  const kinds = ["stage_change", "cycle_ready", "shared_note", "message", ...(user.role === "client" ? (["visit_report"] as const) : [])] as const;
  return (
    <div className="mx-auto flex max-w-2xl flex-col gap-4">
      <h1 className="text-2xl font-bold tracking-tight">Account</h1>
      <ContactForm initial={{ name: contact?.name ?? user.name, phone: contact?.phone ?? "" }} email={contact?.email ?? user.email} isLead={user.role === "lead"} />
      <PrefsForm initial={prefs} kinds={[...kinds]} />
      <CalendarFeed initialUrl={token ? `${env().APP_URL}/api/calendar/${token}.ics` : null} />
    </div>
  );
}
