import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { addLivestockEvent } from "@/db/queries/livestock";
import { livestockEventSchema } from "./livestock-event.schema";

/** One event on a group of fish (a loss, a move to holding and back, a measurement…); the lead or assigned crew. */
export const POST = projectRoute({ action: "record_livestock", schema: livestockEventSchema }, async ({ input, project, user }) => {
  const { at, ...rest } = input;
  const result = await addLivestockEvent({ projectId: project.id, userId: user.id, values: { ...rest, at: at ?? new Date() } });
  return NextResponse.json(result, { status: 201 });
});
