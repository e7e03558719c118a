import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { canOnProject } from "@/lib/auth/permissions";
import { getAttachment, markAttachmentReady } from "@/db/queries/attachments";
import { conflict, notFound, unprocessable } from "@/server/errors";
import { deleteObject, getObjectBytes, headObject, putObject } from "@/server/storage";
import { convertedFileName } from "@/lib/install/upload-rules";
import { prepareFile, storeThumbnail } from "../../finish-upload";

/**
 * After the browser's PUT: checks the stored object's size and contents, stores the re-encoded
 * photo, makes a preview, marks it ready. A refused file is deleted from the bucket at once; the
 * upload link stays valid, so the person can send the right file and finish again.
 */
export const POST = projectRoute<undefined, undefined, { id: string; attachmentId: string }>({ action: "upload_photo" }, async ({ project, relation, user, params }) => {
  const a = await getAttachment(parseId(params.attachmentId, "That upload"));
  if (!a || a.projectId !== project.id || (a.uploadedBy !== user.id && !canOnProject(relation, "finish_others_upload"))) throw notFound("That upload");
  if (a.status === "ready") return NextResponse.json({ id: a.id, status: a.status });
  const head = await headObject(a.key);
  if (!head) throw conflict("The file hasn't arrived yet. Send it to the upload link first, then finish the upload.");
  if (head.size !== a.sizeBytes) {
    await deleteObject(a.key);
    throw unprocessable(`The file that arrived is ${head.size} bytes, not the ${a.sizeBytes} bytes announced. Upload it again.`);
  }
  let prepared: { bytes: Uint8Array; contentType: string };
  try {
    prepared = await prepareFile(await getObjectBytes(a.key), a.contentType);
  } catch (error) {
    await deleteObject(a.key);
    throw error;
  }
  const { bytes, contentType } = prepared;
  await putObject(a.key, bytes, contentType);
  const thumbKey = await storeThumbnail(a.key, bytes, contentType);
  const fileName = contentType === a.contentType ? a.fileName : convertedFileName(a.fileName);
  const ready = await markAttachmentReady(a.id, thumbKey, bytes.byteLength, { contentType, fileName });
  return NextResponse.json({ id: ready.id, status: ready.status, url: `/api/attachments/${ready.id}?variant=full`, thumbUrl: thumbKey ? `/api/attachments/${ready.id}?variant=thumb` : null });
});
