import { NextResponse } from "next/server";
import { parseId, parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { getAttachment } from "@/db/queries/attachments";
import { recaptionPhoto } from "@/db/queries/photo-edits";
import { forbidden, notFound } from "@/server/errors";
import { recaptionSchema } from "./photo-edit.schema";

type Params = { id: string; attachmentId: string };

/** Changes a photo's caption: the lead, or whoever uploaded it. */
export const PATCH = route<Params>(async (req, { params }) => {
  const { id, attachmentId } = await params;
  const input = await parseJson(req, recaptionSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "upload_photo" });
  const photo = await getAttachment(parseId(attachmentId, "That photo"));
  if (!photo || photo.projectId !== project.id) throw notFound("That photo");
  if (user.role !== "lead" && photo.uploadedBy !== user.id) throw forbidden("Only the lead or the person who added the photo can change its caption.");
  const row = await recaptionPhoto(project.id, photo.id, input.caption || null);
  return NextResponse.json({ id: row.id, caption: row.caption });
});
