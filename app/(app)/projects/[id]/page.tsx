import type { Metadata } from "next";
import { requirePageUser } from "@/server/session";
import { projectSectionTitle, requirePageProject } from "@/server/page-project";
import { ClientOverview } from "./_components/client-overview";
import { StaffOverview } from "./_components/staff-overview";
import { getUserContact } from "@/db/queries/users";

export const generateMetadata = ({ params }: { params: Promise<{ id: string }> }): Promise<Metadata> => projectSectionTitle(params, "Overview");

export default async function ProjectOverviewPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { id } = await params;
  const query = await searchParams;
  const user = await requirePageUser();
  const { project } = await requirePageProject(id, user);
  if (user.role === "client") return <ClientOverview project={project} user={user} />;
  // Just created from the New project form: say what happened, including the client's invitation.
  const client = user.role === "lead" && (query.invited === "1" || query.created === "1") ? await getUserContact(project.clientId) : null;
  return (
    <>
      {client && (
        <p role="status" className="mb-4 rounded-lg border border-ok/40 bg-ok-soft px-4 py-2 text-sm" data-testid="created-banner">
          Project created.{" "}
          {query.invited === "1"
            ? `We e-mailed ${client.name} (${client.email}) an invitation to set a password; they will see this project once they sign in.`
            : `${client.name} can see it in their portal.`}
        </p>
      )}
      <StaffOverview project={project} user={user} />
    </>
  );
}
