import "server-only";
import { notFound } from "next/navigation";
import { requireProject } from "../db/queries/project-access";
import { AppError } from "./errors";
import { getSessionUser, type SessionUser } from "./session";
import type { ProjectAction } from "../lib/auth/permissions";

/** For pages: the project, or Next's not-found page when the caller may not see it. */
export async function requirePageProject(projectId: string, user: SessionUser, action: ProjectAction = "view") {
  try {
    return await requireProject({ projectId, user, action });
  } catch (error) {
    if (error instanceof AppError && (error.status === 404 || error.status === 403)) notFound();
    throw error;
  }
}

/**
 * A project page's title, "<project> · <section>" (the root layout adds the product name). A caller
 * who may not see the project gets only the section, so the title reveals nothing.
 */
export async function projectSectionTitle(params: Promise<{ id: string }>, section: string): Promise<{ title: string }> {
  const { id } = await params;
  try {
    const user = await getSessionUser();
    if (!user) return { title: section };
    const { project } = await requireProject({ projectId: id, user, action: "view" });
    return { title: `${project.title} · ${section}` };
  } catch {
    return { title: section };
  }
}
