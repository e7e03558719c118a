import "server-only";
import { notFound } from "next/navigation";
import { requireProject } from "../db/queries/project-access";
import { AppError } from "./errors";
import type { SessionUser } from "./session";
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
