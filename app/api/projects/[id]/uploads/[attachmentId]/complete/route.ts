import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { canOnProject } from "@/lib/auth/permissions";
import { getAttachment, markAttachmentReady } from "@/db/queries/attachments";
import { conflict, notFound, unprocessable } from "@/server/errors";
import { getObjectBytes, headObject } from "@/server/storage";
import { storeThumbnail, vetBytes } from "../../finish-upload";

/** After the browser's PUT: checks the stored object's size and first bytes, makes a preview, marks it ready. */
export const POST = projectRoute<undefined, undefined, { id: string; attachmentId: string }>({ action: "upload_photo" }, async ({ project, relation, user, params }) => {
  const a = await getAttachment(parseId(params.attachmentId, "That upload"));
  if (!a || a.projectId !== project.id || (a.uploadedBy !== user.id && !canOnProject(relation, "finish_others_upload"))) throw notFound("That upload");
  if (a.status === "ready") return NextResponse.json({ id: a.id, status: a.status });
  const head = await headObject(a.key);
  if (!head) throw conflict("The file hasn't arrived yet. Send it to the upload link first, then finish the upload.");
  if (head.size !== a.sizeBytes) throw unprocessable(`The file that arrived is ${head.size} bytes, not the ${a.sizeBytes} bytes announced. Upload it again.`);
  const bytes = await getObjectBytes(a.key);
  vetBytes(bytes, a.contentType);
  const thumbKey = await storeThumbnail(a.key, bytes, a.contentType);
  const ready = await markAttachmentReady(a.id, thumbKey);
  return NextResponse.json({ id: ready.id, status: ready.status, url: `/api/attachments/${ready.id}?variant=full`, thumbUrl: thumbKey ? `/api/attachments/${ready.id}?variant=thumb` : null });
});
