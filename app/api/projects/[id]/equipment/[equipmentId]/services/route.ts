import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { badRequest } from "@/server/errors";
import { recordEquipmentService } from "@/db/queries/equipment";
import { getServiceSettings } from "@/db/queries/service-settings";
import { localDay, zonedInstant } from "@/lib/service/local-dates";
import { equipmentServiceSchema } from "../../equipment.schema";

/**
 * A service done outside a visit (a visit's report records its own). The day is read in the
 * company's time zone; a save sent twice with the same key is recorded once (200 the second time).
 */
export const POST = projectRoute<typeof equipmentServiceSchema, undefined, { id: string; equipmentId: string }>(
  { action: "edit_equipment", schema: equipmentServiceSchema },
  async ({ input, project, params, user }) => {
    const equipmentId = parseId(params.equipmentId, "That piece of equipment");
    const { timeZone } = await getServiceSettings();
    if (input.servicedOn > localDay(new Date(), timeZone)) throw badRequest("Check the date.", { servicedOn: "The service can't be in the future." });
    const result = await recordEquipmentService({
      projectId: project.id,
      equipmentId,
      servicedOn: input.servicedOn,
      servicedAt: zonedInstant(input.servicedOn, "12:00", timeZone),
      note: input.note,
      by: user.id,
      clientKey: input.clientKey,
    });
    return NextResponse.json({ piece: result.piece, service: result.service, repeated: result.repeated }, { status: result.repeated ? 200 : 201 });
  },
);
