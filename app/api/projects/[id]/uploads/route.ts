import { NextResponse } from "next/server";
import { parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { createPendingAttachment } from "@/db/queries/attachments";
import { presignPut, putObject } from "@/server/storage";
import { badRequest } from "@/server/errors";
import { fieldErrorsFromIssues } from "@/server/errors";
import { MAX_UPLOAD_BYTES } from "@/lib/install/upload-rules";
import { uploadSchema, type UploadBody } from "./upload.schema";
import { newObjectKey, storeThumbnail, vetBytes, vetUpload } from "./finish-upload";

/**
 * Starts an upload. JSON `{ fileName, contentType, sizeBytes, stage, caption?, isProblem? }` answers
 * with a presigned PUT URL and a pending attachment to complete afterwards. A multipart form with a
 * `file` field (plus the same fields) is stored in one step through the server, which is what the
 * app's own pages use so a phone needs only one connection.
 */
export const POST = route<{ id: string }>(async (req, { params }) => {
  const multipart = (req.headers.get("content-type") ?? "").startsWith("multipart/form-data");
  let input: UploadBody;
  let file: File | null = null;
  if (multipart) {
    const form = await req.formData().catch(() => null);
    if (!form) throw badRequest("The upload was cut off. Try again.");
    const f = form.get("file");
    if (!(f instanceof File)) throw badRequest("Choose a file to upload.", { file: "Choose a file to upload." });
    file = f;
    const parsed = uploadSchema.safeParse({
      fileName: f.name,
      contentType: f.type,
      sizeBytes: f.size,
      stage: form.get("stage"),
      caption: form.get("caption") || null,
      isProblem: form.get("isProblem") === "true",
    });
    if (!parsed.success) throw badRequest("Some fields need attention.", fieldErrorsFromIssues(parsed.error.issues));
    input = parsed.data;
  } else {
    input = await parseJson(req, uploadSchema);
  }
  const user = await requireUser();
  const { project } = await requireProject({ projectId: (await params).id, user, action: "upload_photo" });
  const vetted = vetUpload(input);
  // A client's upload is always a problem photo on the project's current stage.
  const isClient = user.role === "client";
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
    const bytes = new Uint8Array(await file.arrayBuffer());
    if (bytes.byteLength > MAX_UPLOAD_BYTES) throw badRequest("The file is too large.", { sizeBytes: "The file is too large." });
    vetBytes(bytes, vetted.contentType);
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
});

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
