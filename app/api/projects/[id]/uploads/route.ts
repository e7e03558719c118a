import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { canOnProject } from "@/lib/auth/permissions";
import { createPendingAttachment, findAttachmentByClientKey, type AttachmentRow } from "@/db/queries/attachments";
import { deleteObject, presignPut, putObject } from "@/server/storage";
import { badRequest, conflict } from "@/server/errors";
import { MAX_UPLOAD_BYTES, convertedFileName } from "@/lib/install/upload-rules";
import { uploadSchema } from "./upload.schema";
import { newObjectKey, prepareFile, storeThumbnail, vetUpload } from "./finish-upload";

// Room for the form's boundaries and text fields around the file itself.
const FORM_OVERHEAD_BYTES = 64 * 1024;

/**
 * Starts an upload. JSON `{ fileName, contentType, sizeBytes, stage, caption?, isProblem? }` answers
 * with a presigned PUT URL and a pending attachment to complete afterwards. A multipart form with a
 * `file` field (plus the same fields) is stored in one step through the server, which is what the
 * app's own pages use so a phone needs only one connection.
 */
export const POST = projectRoute(
  { action: "upload_photo", schema: uploadSchema, multipart: { limit: MAX_UPLOAD_BYTES + FORM_OVERHEAD_BYTES, toInput: formToUpload } },
  async ({ input, form, project, relation, user }) => {
  const file = form?.get("file") instanceof File ? (form.get("file") as File) : null;
  const vetted = vetUpload(input);
  const clientKey = input.clientKey ?? null;
  // A device sending the same photo again (its first answer was lost) gets the first upload back.
  if (clientKey) {
    const earlier = await findAttachmentByClientKey(user.id, clientKey);
    if (earlier) return repeatAnswer(earlier, project.id);
  }
  // Someone who can't file stage photos (a client) always uploads a problem photo on the current stage.
  const isClient = !canOnProject(relation, "file_stage_photos");
  const base = {
    projectId: project.id,
    stage: isClient ? project.stage : input.stage,
    key: newObjectKey(project.id),
    contentType: vetted.contentType as string,
    sizeBytes: input.sizeBytes,
    fileName: vetted.fileName,
    caption: input.caption || null,
    isProblem: isClient ? true : input.isProblem,
    uploadedBy: user.id,
    clientKey,
    takenAt: input.takenAt ? new Date(input.takenAt) : null,
  };

  if (file) {
    const sent = new Uint8Array(await file.arrayBuffer());
    if (sent.byteLength > MAX_UPLOAD_BYTES) throw badRequest("The file is too large.", { sizeBytes: "The file is too large." });
    const prepared = await prepareFile(sent, vetted.contentType);
    await putObject(base.key, prepared.bytes, prepared.contentType);
    const thumbKey = await storeThumbnail(base.key, prepared.bytes, prepared.contentType);
    const fileName = prepared.contentType === vetted.contentType ? base.fileName : convertedFileName(base.fileName);
    const attachment = await createPendingAttachment({ ...base, contentType: prepared.contentType, fileName, sizeBytes: prepared.bytes.byteLength, status: "ready", thumbKey });
    if (!attachment) return lostRace(base.key, thumbKey, user.id, clientKey, project.id);
    return NextResponse.json({ attachment: publicAttachment(attachment) }, { status: 201 });
  }

  const attachment = await createPendingAttachment(base);
  if (!attachment) return lostRace(base.key, null, user.id, clientKey, project.id);
  return presignAnswer(attachment, project.id, 201);
  },
);

async function presignAnswer(attachment: AttachmentRow, projectId: string, status: number) {
  return NextResponse.json(
    {
      attachment: publicAttachment(attachment),
      uploadUrl: await presignPut(attachment.key, attachment.contentType),
      uploadHeaders: { "content-type": attachment.contentType },
      completeUrl: `/api/projects/${projectId}/uploads/${attachment.id}/complete`,
    },
    { status },
  );
}

/** The answer to a repeated device key: the finished photo, or the same upload link again. */
async function repeatAnswer(earlier: AttachmentRow, projectId: string) {
  if (earlier.projectId !== projectId) throw conflict("This photo was already sent to another project. Take it again to add it here.");
  if (earlier.status === "ready") return NextResponse.json({ attachment: publicAttachment(earlier), repeated: true }, { status: 200 });
  return presignAnswer(earlier, projectId, 200);
}

/** Two tries of one photo arrived together and the other was recorded first: keep only its files. */
async function lostRace(key: string, thumbKey: string | null, userId: string, clientKey: string | null, projectId: string) {
  await deleteObject(key);
  if (thumbKey) await deleteObject(thumbKey);
  const earlier = clientKey ? await findAttachmentByClientKey(userId, clientKey) : null;
  if (!earlier) throw conflict("The photo couldn't be recorded. Send it again.");
  return repeatAnswer(earlier, projectId);
}

/** The form's fields, shaped like the JSON body, so one schema checks both. */
function formToUpload(form: FormData) {
  const f = form.get("file");
  if (!(f instanceof File)) throw badRequest("Choose a file to upload.", { file: "Choose a file to upload." });
  return {
    fileName: f.name,
    contentType: f.type,
    sizeBytes: f.size,
    stage: form.get("stage"),
    caption: form.get("caption") || null,
    isProblem: form.get("isProblem") === "true",
    clientKey: form.get("clientKey") || null,
    takenAt: form.get("takenAt") || null,
  };
}

function publicAttachment(a: { id: string; stage: string; fileName: string; contentType: string; sizeBytes: number; caption: string | null; isProblem: boolean; status: string; thumbKey: string | null }) {
  return {
    id: a.id,
    stage: a.stage,
    fileName: a.fileName,
    contentType: a.contentType,
    sizeBytes: a.sizeBytes,
    caption: a.caption,
    isProblem: a.isProblem,
    status: a.status,
    url: `/api/attachments/${a.id}?variant=full`,
    thumbUrl: a.thumbKey ? `/api/attachments/${a.id}?variant=thumb` : null,
  };
}
