import { NextResponse } from "next/server";
import { route, parseId } from "@/server/route";
import { requireUser } from "@/server/session";
import { retireTestKit } from "@/db/queries/test-kits";

/** Retires a kit the company no longer uses; it is kept for the record. Lead only. */
export const POST = route<{ id: string }>(async (_req, ctx) => {
  const id = parseId((await ctx.params).id, "That kit");
  await requireUser("lead");
  return NextResponse.json({ kit: await retireTestKit(id) });
});
