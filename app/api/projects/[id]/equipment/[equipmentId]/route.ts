import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { updateEquipment } from "@/db/queries/equipment";
import { getServiceSettings } from "@/db/queries/service-settings";
import { localDay } from "@/lib/service/local-dates";
import { equipmentSchema } from "../equipment.schema";
import { pieceValues } from "../piece-values";

/** Changes a piece's details; its services are recorded one by one. */
export const PATCH = projectRoute<typeof equipmentSchema, undefined, { id: string; equipmentId: string }>({ action: "edit_equipment", schema: equipmentSchema }, async ({ input, project, params }) => {
  const equipmentId = parseId(params.equipmentId, "That piece of equipment");
  const { timeZone } = await getServiceSettings();
  const piece = await updateEquipment({ projectId: project.id, equipmentId, values: pieceValues(input, localDay(new Date(), timeZone)) });
  return NextResponse.json({ piece });
});
