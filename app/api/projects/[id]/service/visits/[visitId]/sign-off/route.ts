import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { signOffVisit } from "@/db/queries/visit-reports";
import { signerOf } from "../../../signer";

/** Signs the report off: the visit is complete, the report locks and the client is e-mailed it. */
export const POST = projectRoute<undefined, undefined, { id: string; visitId: string }>({ action: "record_visit" }, async ({ project, relation, user, params }) => {
  const result = await signOffVisit({ projectId: project.id, visitId: parseId(params.visitId, "That visit"), who: signerOf(relation), user: { id: user.id, name: user.name } });
  return NextResponse.json(result);
});
