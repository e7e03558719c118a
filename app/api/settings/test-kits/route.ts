import { NextResponse } from "next/server";
import { route, parseJson } from "@/server/route";
import { requireUser } from "@/server/session";
import { badRequest, type FieldErrors } from "@/server/errors";
import { addTestKit, listTestKits } from "@/db/queries/test-kits";
import { validateKit } from "@/lib/cycling/test-kits";
import { testKitSchema } from "@/app/(app)/settings/test-kit.schema";

/** The company's kits, retired ones included. Lead only. */
export const GET = route(async () => {
  await requireUser("lead");
  return NextResponse.json({ kits: await listTestKits({ includeRetired: true }) });
});

/** Adds a kit the company uses. Lead only. */
export const POST = route(async (req) => {
  const input = await parseJson(req, testKitSchema);
  const user = await requireUser("lead");
  const problems = validateKit(input);
  if (problems.length) {
    const fields: FieldErrors = {};
    for (const p of problems) fields[p.field] ??= p.message;
    throw badRequest("The kit needs a little more; nothing was saved.", fields);
  }
  const kit = await addTestKit(input, user.id);
  return NextResponse.json({ kit }, { status: 201 });
});
