import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { canOnProject } from "@/lib/auth/permissions";
import { addEquipment, listEquipment } from "@/db/queries/equipment";
import { getServiceSettings } from "@/db/queries/service-settings";
import { localDay, zonedInstant } from "@/lib/service/local-dates";
import { newEquipmentSchema } from "./equipment.schema";
import { pieceValues } from "./piece-values";

/** The tank's equipment register; the client reads the pieces in use without the team's notes. */
export const GET = projectRoute({ action: "view" }, async ({ project, relation }) => NextResponse.json({ equipment: await listEquipment(project.id, { internal: canOnProject(relation, "view_internal") }) }));

/** The lead or the assigned crew add a piece to the tank. */
export const POST = projectRoute({ action: "edit_equipment", schema: newEquipmentSchema }, async ({ input, project, user }) => {
  const { timeZone } = await getServiceSettings();
  const values = pieceValues(input, localDay(new Date(), timeZone));
  const piece = await addEquipment({ projectId: project.id, values, lastServicedAt: input.lastServicedOn ? zonedInstant(input.lastServicedOn, "12:00", timeZone) : null, by: user.id });
  return NextResponse.json({ piece }, { status: 201 });
});
