import { badRequest } from "@/server/errors";
import { equipmentDateProblems } from "@/lib/service/equipment-due";
import type { PieceValues } from "@/db/queries/equipment";

/** The piece's columns from a parsed body, after the date checks that need today's date in the company's zone. */
export function pieceValues(input: PieceValues & { lastServicedOn?: string | null }, today: string): PieceValues {
  const problems = equipmentDateProblems({ installedOn: input.installedOn, warrantyUntil: input.warrantyUntil, lastServicedOn: input.lastServicedOn ?? null }, today);
  if (problems.length) throw badRequest("Check the dates.", Object.fromEntries(problems.map((p) => [p.field, p.message])));
  return { kind: input.kind, makeModel: input.makeModel, installedOn: input.installedOn, warrantyUntil: input.warrantyUntil, serviceIntervalDays: input.serviceIntervalDays, notes: input.notes };
}
