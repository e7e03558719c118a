import { NextResponse } from "next/server";
import { parseId, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { getAttachment } from "@/db/queries/attachments";
import { notFound } from "@/server/errors";
import { presignGet } from "@/server/storage";

/**
 * Sends a person who may see the project to a short-lived signed link for the file or its preview.
 * Anyone else gets the same 404 as for a file that doesn't exist.
 */
export const GET = route<{ id: string }>(async (req, { params }) => {
  const user = await requireUser();
  const a = await getAttachment(parseId((await params).id, "That file"));
  if (!a || a.status !== "ready") throw notFound("That file");
  try {
    await requireProject({ projectId: a.projectId, user, action: "view" });
  } catch {
    throw notFound("That file");
  }
  // A voided photo stays on record for the team only.
  if (a.voidedAt && user.role === "client") throw notFound("That file");
  const thumb = new URL(req.url).searchParams.get("variant") === "thumb" && a.thumbKey;
  const url = thumb
    ? await presignGet(a.thumbKey!, { contentType: "image/webp" })
    : await presignGet(a.key, { contentType: a.contentType, fileName: a.fileName });
  const res = NextResponse.redirect(url, 302);
  res.headers.set("cache-control", "private, no-store");
  return res;
});
