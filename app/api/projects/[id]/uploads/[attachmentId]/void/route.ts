import { NextResponse } from "next/server";
import { parseId, parseJson, route } from "@/server/route";
import { requireUser } from "@/server/session";
import { requireProject } from "@/db/queries/project-access";
import { voidPhoto } from "@/db/queries/photo-edits";
import { voidPhotoSchema } from "../photo-edit.schema";

/** The lead voids a photo with a reason (nothing is deleted): it leaves the galleries and the client's view. */
export const POST = route<{ id: string; attachmentId: string }>(async (req, { params }) => {
  const { id, attachmentId } = await params;
  const input = await parseJson(req, voidPhotoSchema);
  const user = await requireUser();
  const { project } = await requireProject({ projectId: id, user, action: "void_water_test" });
  const row = await voidPhoto(project.id, parseId(attachmentId, "That photo"), user.id, input.reason);
  return NextResponse.json({ id: row.id, voidedAt: row.voidedAt, voidReason: row.voidReason });
});
