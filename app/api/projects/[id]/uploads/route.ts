import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { canOnProject } from "@/lib/auth/permissions";
import { createPendingAttachment } from "@/db/queries/attachments";
import { presignPut, putObject } from "@/server/storage";
import { badRequest } from "@/server/errors";
import { MAX_UPLOAD_BYTES } from "@/lib/install/upload-rules";
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
  // Someone who can't file stage photos (a client) always uploads a problem photo on the current stage.
  const isClient = !canOnProject(relation, "file_stage_photos");
  const base = {
    projectId: project.id,
    stage: isClient ? project.stage : input.stage,
    key: newObjectKey(project.id),
    contentType: vetted.contentType,
    sizeBytes: input.sizeBytes,
    fileName: vetted.fileName,
    caption: input.caption || null,
    isProblem: isClient ? true : input.isProblem,
    uploadedBy: user.id,
  };

  if (file) {
    const sent = new Uint8Array(await file.arrayBuffer());
    if (sent.byteLength > MAX_UPLOAD_BYTES) throw badRequest("The file is too large.", { sizeBytes: "The file is too large." });
    const bytes = await prepareFile(sent, vetted.contentType);
    await putObject(base.key, bytes, vetted.contentType);
    const thumbKey = await storeThumbnail(base.key, bytes, vetted.contentType);
    const attachment = await createPendingAttachment({ ...base, sizeBytes: bytes.byteLength, status: "ready", thumbKey });
    return NextResponse.json({ attachment: publicAttachment(attachment) }, { status: 201 });
  }

  const attachment = await createPendingAttachment(base);
  return NextResponse.json(
    {
      attachment: publicAttachment(attachment),
      uploadUrl: await presignPut(attachment.key, attachment.contentType),
      uploadHeaders: { "content-type": attachment.contentType },
      completeUrl: `/api/projects/${project.id}/uploads/${attachment.id}/complete`,
    },
    { status: 201 },
  );
  },
);

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
