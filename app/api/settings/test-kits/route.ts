import { NextResponse } from "next/server";
import { userRoute } from "@/server/route";
import { badRequest, type FieldErrors } from "@/server/errors";
import { addTestKit, listTestKits } from "@/db/queries/test-kits";
import { validateKit } from "@/lib/cycling/test-kits";
import { testKitSchema } from "./test-kit.schema";

/** The company's kits, retired ones included. Lead only. */
export const GET = userRoute({ roles: ["lead"] }, async () => NextResponse.json({ kits: await listTestKits({ includeRetired: true }) }));

/** Adds a kit the company uses. Lead only. */
export const POST = userRoute({ roles: ["lead"], schema: testKitSchema }, async ({ input, user }) => {
  const problems = validateKit(input);
  if (problems.length) {
    const fields: FieldErrors = {};
    for (const p of problems) fields[p.field] ??= p.message;
    throw badRequest("The kit needs a little more; nothing was saved.", fields);
  }
  const kit = await addTestKit(input, user.id);
  return NextResponse.json({ kit }, { status: 201 });
});
