import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { getAttachment } from "@/db/queries/attachments";
import { recaptionPhoto } from "@/db/queries/photo-edits";
import { forbidden, notFound } from "@/server/errors";
import { recaptionSchema } from "./photo-edit.schema";

/** Changes a photo's caption: the lead, or whoever uploaded it. */
export const PATCH = projectRoute<typeof recaptionSchema, undefined, { id: string; attachmentId: string }>(
  { action: "upload_photo", schema: recaptionSchema },
  async ({ input, project, user, params }) => {
    const photo = await getAttachment(parseId(params.attachmentId, "That photo"));
    if (!photo || photo.projectId !== project.id) throw notFound("That photo");
    if (user.role !== "lead" && photo.uploadedBy !== user.id) throw forbidden("Only the lead or the person who added the photo can change its caption.");
    const row = await recaptionPhoto(project.id, photo.id, input.caption || null);
    return NextResponse.json({ id: row.id, caption: row.caption });
  },
);
