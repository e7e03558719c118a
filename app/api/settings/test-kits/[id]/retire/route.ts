import { NextResponse } from "next/server";
import { userRoute, parseId } from "@/server/route";
import { retireTestKit } from "@/db/queries/test-kits";

/** Retires a kit the company no longer uses; it is kept for the record. Lead only. */
export const POST = userRoute<undefined, undefined, { id: string }>({ roles: ["lead"] }, async ({ params }) =>
  NextResponse.json({ kit: await retireTestKit(parseId(params.id, "That kit")) }),
);
