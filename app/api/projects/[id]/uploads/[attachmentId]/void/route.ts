import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { voidPhoto } from "@/db/queries/photo-edits";
import { voidPhotoSchema } from "../photo-edit.schema";

/** The lead voids a photo with a reason (nothing is deleted): it leaves the galleries and the client's view. */
export const POST = projectRoute<typeof voidPhotoSchema, undefined, { id: string; attachmentId: string }>(
  { action: "void_water_test", schema: voidPhotoSchema },
  async ({ input, project, user, params }) => {
    const row = await voidPhoto(project.id, parseId(params.attachmentId, "That photo"), user.id, input.reason);
    return NextResponse.json({ id: row.id, voidedAt: row.voidedAt, voidReason: row.voidReason });
  },
);
