import { NextResponse } from "next/server";
import { route, parseJson } from "@/server/route";
import { requireUser } from "@/server/session";
import { billMonthlyPlans } from "@/db/queries/invoices";
import { monthlySchema } from "./monthly.schema";

/** Bills one month of every in-service project's plan; running it again for the same month bills nothing more. */
export const POST = route(async (req) => {
  const input = await parseJson(req, monthlySchema);
  await requireUser("lead");
  return NextResponse.json({ period: input.period, issued: await billMonthlyPlans(input.period) });
});
