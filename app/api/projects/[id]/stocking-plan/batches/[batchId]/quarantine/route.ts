import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { startQuarantine } from "@/db/queries/quarantine";
import { startQuarantineSchema } from "../quarantine.schema";

type Params = { id: string; batchId: string };

/** Puts a planned batch into a holding tank; the lead or assigned crew. */
export const POST = projectRoute<typeof startQuarantineSchema, undefined, Params>({ action: "record_quarantine", schema: startQuarantineSchema }, async ({ input, project, params }) => {
  const batch = await startQuarantine({ projectId: project.id, batchId: parseId(params.batchId, "That batch"), holdingTankId: input.holdingTankId, startedAt: input.startedAt ?? new Date() });
  return NextResponse.json({ batch }, { status: 201 });
});
