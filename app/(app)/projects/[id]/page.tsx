import type { Metadata } from "next";
import { requirePageUser } from "@/server/session";
import { projectSectionTitle, requirePageProject } from "@/server/page-project";
import { ClientOverview } from "./_components/client-overview";
import { StaffOverview } from "./_components/staff-overview";

export const generateMetadata = ({ params }: { params: Promise<{ id: string }> }): Promise<Metadata> => projectSectionTitle(params, "Overview");

export default async function ProjectOverviewPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requirePageUser();
  const { project } = await requirePageProject(id, user);
  return user.role === "client" ? <ClientOverview project={project} user={user} /> : <StaffOverview project={project} user={user} />;
}
