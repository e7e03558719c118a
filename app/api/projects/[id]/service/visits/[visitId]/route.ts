import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { getVisitReport, updateVisitReport } from "@/db/queries/visit-reports";
import { canOnProject } from "@/lib/auth/permissions";
import { reportSchema } from "../../service.schema";
import { signerOf } from "../../signer";

type P = { id: string; visitId: string };

/** The visit's report: the team reads it any time; the client only once signed off, without internal notes. */
export const GET = projectRoute<undefined, undefined, P>({ action: "view" }, async ({ project, relation, params }) => {
  const audience = canOnProject(relation, "view_internal") ? "team" : "client";
  return NextResponse.json({ report: await getVisitReport({ projectId: project.id, visitId: parseId(params.visitId, "That visit"), audience }) });
});

/** Saves the report's written parts while it is open. */
export const PATCH = projectRoute<typeof reportSchema, undefined, P>({ action: "record_visit", schema: reportSchema }, async ({ input, project, relation, params }) => {
  const row = await updateVisitReport({ projectId: project.id, visitId: parseId(params.visitId, "That visit"), who: signerOf(relation), fields: input });
  return NextResponse.json({ report: { waterChangeL: row.waterChangeL, livestockNote: row.livestockNote, clientNotes: row.clientNotes, internalNotes: row.internalNotes } });
});
