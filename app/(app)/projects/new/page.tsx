import type { Metadata } from "next";
import Link from "next/link";
import { requirePageUser } from "@/server/session";
import { listProjectFormPeople } from "@/db/queries/project-create";
import { NewProjectForm } from "./_components/new-project-form";

export const metadata: Metadata = { title: "New project" };

export default async function NewProjectPage() {
  const user = await requirePageUser("lead");
  const people = await listProjectFormPeople();
  return (
    <div className="mx-auto flex max-w-3xl flex-col gap-4">
      <Link href="/board" className="text-sm font-semibold text-accent hover:underline">
        ← Back to the board
      </Link>
      <h1 className="text-2xl font-bold tracking-tight">New project</h1>
      <p className="text-sm text-muted">The project starts at the end of the site-survey column. A new client gets an e-mail to set their password.</p>
      <NewProjectForm clients={people.clients} leads={people.leads} crew={people.crew} defaultLeadId={user.id} />
    </div>
  );
}
