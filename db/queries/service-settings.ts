import "server-only";
import { eq } from "drizzle-orm";
import { db, type Db, type Tx } from "../index";
import { company } from "../schema";
import type { CompanyIntervals } from "../../lib/service/equipment-due";
import { unprocessable } from "../../server/errors";

export type ServiceSettings = { timeZone: string; equipmentIntervals: CompanyIntervals };

/** The company's time zone and its own equipment service intervals. */
export async function getServiceSettings(conn: Db | Tx = db()): Promise<ServiceSettings> {
  const [row] = await conn.select({ timeZone: company.timeZone, equipmentIntervals: company.equipmentIntervals }).from(company).limit(1);
  return { timeZone: row?.timeZone ?? "UTC", equipmentIntervals: row?.equipmentIntervals ?? {} };
}

async function update(values: Partial<typeof company.$inferInsert>) {
  const rows = await db()
    .update(company)
    .set({ ...values, updatedAt: new Date() })
    .where(eq(company.id, 1))
    .returning({ id: company.id });
  if (!rows.length) throw unprocessable("The company's details aren't set up yet.");
}

export const setCompanyTimeZone = (timeZone: string) => update({ timeZone });
export const setEquipmentIntervals = (equipmentIntervals: CompanyIntervals) => update({ equipmentIntervals: equipmentIntervals as Record<string, number | null> });
