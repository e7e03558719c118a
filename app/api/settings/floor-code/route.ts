import { NextResponse } from "next/server";
import { userRoute } from "@/server/route";
import { unprocessable } from "@/server/errors";
import { getCompanyFloorCode, setCompanyFloorCode } from "@/db/queries/company-settings";
import { FLOOR_CODE_VALUES } from "@/lib/tank/floor-codes";
import { floorCodeSchema } from "./floor-code.schema";

/** The company's building code for floor screening, with its figures. Lead only. */
export const GET = userRoute({ roles: ["lead"] }, async () => {
  const code = await getCompanyFloorCode();
  return NextResponse.json({ floorCode: code, values: FLOOR_CODE_VALUES[code] });
});

/**
 * Sets the code. Approvals screened under the other code stop standing (their floor basis names
 * the code), so each project's lead approves the load check again under the new one.
 */
export const PUT = userRoute({ roles: ["lead"], schema: floorCodeSchema }, async ({ input }) => {
  if (!(await setCompanyFloorCode(input.floorCode))) throw unprocessable("The company's details aren't set up yet.");
  return NextResponse.json({ floorCode: input.floorCode, values: FLOOR_CODE_VALUES[input.floorCode] });
});
