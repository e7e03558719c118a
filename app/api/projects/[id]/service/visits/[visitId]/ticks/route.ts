import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { recordVisitTick } from "@/db/queries/visit-reports";
import { visitTickSchema } from "../../../service.schema";
import { signerOf } from "../../../signer";

/** Ticks or unticks a task on the visit. The same clientKey sent again answers 200 with the stored tick. */
export const POST = projectRoute<typeof visitTickSchema, undefined, { id: string; visitId: string }>(
  { action: "record_visit", schema: visitTickSchema },
  async ({ input, project, relation, user, params }) => {
    const { tick, replayed } = await recordVisitTick({
      projectId: project.id,
      visitId: parseId(params.visitId, "That visit"),
      who: signerOf(relation),
      userId: user.id,
      taskIndex: input.taskIndex,
      done: input.done,
      clientKey: input.clientKey,
    });
    return NextResponse.json({ tick: { taskIndex: tick.taskIndex, done: tick.done, at: tick.at }, replayed }, { status: replayed ? 200 : 201 });
  },
);
