import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { addVisitPhoto } from "@/db/queries/visit-reports";
import { visitPhotoSchema } from "../../../service.schema";
import { signerOf } from "../../../signer";

/** Puts a photo (uploaded through the project's uploads) on the visit's report. */
export const POST = projectRoute<typeof visitPhotoSchema, undefined, { id: string; visitId: string }>(
  { action: "record_visit", schema: visitPhotoSchema },
  async ({ input, project, relation, user, params }) => {
    const photo = await addVisitPhoto({ projectId: project.id, visitId: parseId(params.visitId, "That visit"), who: signerOf(relation), userId: user.id, attachmentId: input.attachmentId });
    return NextResponse.json({ photo }, { status: 201 });
  },
);
