import { NextResponse } from "next/server";
import { parseId, projectRoute } from "@/server/route";
import { withEditableVisit } from "@/db/queries/visit-reports";
import { serviceEquipmentOnVisit } from "@/db/queries/visit-equipment";
import { equipmentServiceSchema } from "../../../service.schema";
import { signerOf } from "../../../signer";

/** Marks a piece of the tank's equipment serviced on this visit, which restarts its service clock. */
export const POST = projectRoute<typeof equipmentServiceSchema, undefined, { id: string; visitId: string }>(
  { action: "record_visit", schema: equipmentServiceSchema },
  async ({ input, project, relation, user, params }) => {
    const visitId = parseId(params.visitId, "That visit");
    const { service, replayed } = await withEditableVisit({ projectId: project.id, visitId, who: signerOf(relation) }, (tx) =>
      serviceEquipmentOnVisit(tx, { projectId: project.id, visitId, equipmentId: input.equipmentId, userId: user.id, clientKey: input.clientKey, note: input.note ?? null }),
    );
    return NextResponse.json({ service: { equipmentId: service.equipmentId, servicedAt: service.servicedAt }, replayed }, { status: replayed ? 200 : 201 });
  },
);
