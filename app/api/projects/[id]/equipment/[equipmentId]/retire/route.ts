import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { retireEquipment } from "@/db/queries/equipment";
import { retireEquipmentSchema } from "../../equipment.schema";

/** Takes a piece out of use, with a reason; it stays on the record. */
export const POST = projectRoute<typeof retireEquipmentSchema, undefined, { id: string; equipmentId: string }>({ action: "edit_equipment", schema: retireEquipmentSchema }, async ({ input, project, params, user }) => {
  const piece = await retireEquipment({ projectId: project.id, equipmentId: parseId(params.equipmentId, "That piece of equipment"), by: user.id, reason: input.reason });
  return NextResponse.json({ piece });
});
