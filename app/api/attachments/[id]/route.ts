import { z } from "zod";
import { parseId, projectFor, userRoute } from "@/server/route";
import { getAttachment } from "@/db/queries/attachments";
import { AppError, notFound } from "@/server/errors";
import { getObjectStream } from "@/server/storage";
import { isImageType } from "@/lib/install/upload-rules";
import { contentDisposition } from "@/lib/install/disposition";

const querySchema = z.object({ variant: z.enum(["full", "thumb"]).optional() });

/**
 * The file or its preview, for a person who may see the project; anyone else gets the same 404 as
 * for a file that doesn't exist. Served through the app rather than by a link to the bucket, so it
 * always carries the type verified at upload, `nosniff` and a sandbox: no upload is ever run as a
 * page. Photos show inline; a PDF is a download.
 */
export const GET = userRoute<undefined, typeof querySchema, { id: string }>({ query: querySchema }, async ({ user, params, query }) => {
  const a = await getAttachment(parseId(params.id, "That file"));
  if (!a || a.status !== "ready") throw notFound("That file");
  try {
    await projectFor(a.projectId, user, "view");
  } catch (error) {
    if (error instanceof AppError) throw notFound("That file");
    throw error;
  }
  const thumb = query.variant === "thumb" && a.thumbKey ? a.thumbKey : null;
  const type = thumb ? "image/webp" : a.contentType;
  const { body, size } = await getObjectStream(thumb ?? a.key);
  const headers = new Headers({
    "content-type": type,
    "x-content-type-options": "nosniff",
    "content-disposition": contentDisposition(isImageType(type) ? "inline" : "attachment", a.fileName),
    "content-security-policy": "default-src 'none'; sandbox",
    "cache-control": "private, no-store",
  });
  if (size !== undefined) headers.set("content-length", String(size));
  return new Response(body, { headers });
});
