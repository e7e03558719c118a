import { NextResponse } from "next/server";
import { z } from "zod";
import { parseId, projectFor, userRoute } from "@/server/route";
import { getAttachment } from "@/db/queries/attachments";
import { AppError, notFound } from "@/server/errors";
import { presignGet } from "@/server/storage";

const querySchema = z.object({ variant: z.enum(["full", "thumb"]).optional() });

/**
 * Sends a person who may see the project to a short-lived signed link for the file or its preview.
 * Anyone else gets the same 404 as for a file that doesn't exist.
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
  const thumb = query.variant === "thumb" && a.thumbKey;
  const url = thumb
    ? await presignGet(a.thumbKey!, { contentType: "image/webp" })
    : await presignGet(a.key, { contentType: a.contentType, fileName: a.fileName });
  const res = NextResponse.redirect(url, 302);
  res.headers.set("cache-control", "private, no-store");
  return res;
});
