import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { overrideQuarantine } from "@/db/queries/quarantine";
import { quarantineOverrideSchema } from "../quarantine.schema";

type Params = { id: string; batchId: string };

/** The lead's written reason to release a batch before its quarantine period ends. */
export const POST = projectRoute<typeof quarantineOverrideSchema, undefined, Params>({ action: "override_quarantine", schema: quarantineOverrideSchema }, async ({ input, project, user, params }) => {
  const batch = await overrideQuarantine({ projectId: project.id, batchId: parseId(params.batchId, "That batch"), userId: user.id, reason: input.reason });
  return NextResponse.json({ batch });
});
