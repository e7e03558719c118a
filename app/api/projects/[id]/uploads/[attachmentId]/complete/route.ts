import { NextResponse } from "next/server";
import { parseId, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { getAttachment, markAttachmentReady } from "@/db/queries/attachments";
import { conflict, notFound, unprocessable } from "@/server/errors";
import { getObjectBytes, headObject } from "@/server/storage";
import { storeThumbnail, vetBytes } from "../../finish-upload";

/** After the browser's PUT: checks the stored object's size and first bytes, makes a preview, marks it ready. */
export const POST = route<{ id: string; attachmentId: string }>(async (_req, { params }) => {
  const p = await params;
  const user = await requireUser();
  const { project } = await requireProject({ projectId: p.id, user, action: "upload_photo" });
  const a = await getAttachment(parseId(p.attachmentId, "That upload"));
  if (!a || a.projectId !== project.id || (a.uploadedBy !== user.id && user.role !== "lead")) throw notFound("That upload");
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
