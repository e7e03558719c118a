import { NextResponse } from "next/server";
import { userRoute } from "@/server/route";
import { getMoneySettings, saveMoneySettings } from "@/db/queries/money-settings";
import { moneySettingsSchema } from "./money-settings.schema";

export const GET = userRoute({ roles: ["lead"] }, async () => {
  return NextResponse.json({ settings: await getMoneySettings() });
});

export const PUT = userRoute({ roles: ["lead"], schema: moneySettingsSchema }, async ({ input }) => {
  return NextResponse.json({ settings: await saveMoneySettings(input) });
});
