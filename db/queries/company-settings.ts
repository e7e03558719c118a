import "server-only";
import { eq } from "drizzle-orm";
import { db, type Db, type Tx } from "../index";
import { company } from "../schema";
import { DEFAULT_FLOOR_CODE, type FloorCode } from "../../lib/tank/floor-codes";

/** The building code the company screens floors against. */
export async function getCompanyFloorCode(conn: Db | Tx = db()): Promise<FloorCode> {
  const [row] = await conn.select({ code: company.floorCode }).from(company).limit(1);
  return row?.code ?? DEFAULT_FLOOR_CODE;
}

/** Sets the company's building code; false when there is no company row yet. */
export async function setCompanyFloorCode(code: FloorCode): Promise<boolean> {
  const rows = await db().update(company).set({ floorCode: code, updatedAt: new Date() }).where(eq(company.id, 1)).returning({ id: company.id });
  return rows.length > 0;
}
