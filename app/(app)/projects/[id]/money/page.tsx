import type { Metadata } from "next";
import { requirePageUser } from "@/server/session";
import { requirePageProject } from "@/server/page-project";
import { canOnProject } from "@/lib/auth/permissions";
import { LeadMoney } from "./_components/lead-money";
import { ClientMoney } from "./_components/client-money";

export const metadata: Metadata = { title: "Money" };
export const dynamic = "force-dynamic";

/** The project's quote, schedule and invoices: the lead prices and bills; the client accepts and pays. */
export default async function ProjectMoneyPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ payment?: string }> }) {
  const { id } = await params;
  const { payment } = await searchParams;
  const user = await requirePageUser("lead", "client");
  const { project, relation } = await requirePageProject(id, user, "see_money");
  const today = new Date().toISOString().slice(0, 10);
  return canOnProject(relation, "manage_money") ? <LeadMoney projectId={project.id} today={today} /> : <ClientMoney projectId={project.id} user={user} today={today} payment={payment ?? null} />;
}
