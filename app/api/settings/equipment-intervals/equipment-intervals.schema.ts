import { z } from "zod";
import { EQUIPMENT_KINDS, type EquipmentKind } from "@/lib/service/equipment-kinds";
import { serviceIntervalField } from "@/app/api/projects/[id]/equipment/equipment.schema";

/** The company's days between services for each kind; empty is "no routine service". Every kind is sent. */
export const equipmentIntervalsSchema = z.object(Object.fromEntries(EQUIPMENT_KINDS.map((k) => [k, serviceIntervalField])) as Record<EquipmentKind, typeof serviceIntervalField>);

export type EquipmentIntervalsInput = z.input<typeof equipmentIntervalsSchema>;
