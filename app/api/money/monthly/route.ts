import { NextResponse } from "next/server";
import { userRoute } from "@/server/route";
import { billMonthlyPlans } from "@/db/queries/invoices";
import { monthlySchema } from "./monthly.schema";

/** Bills one month of every in-service project's plan; running it again for the same month bills nothing more. */
export const POST = userRoute({ roles: ["lead"], schema: monthlySchema }, async ({ input }) => {
  return NextResponse.json({ period: input.period, issued: await billMonthlyPlans(input.period) });
});
