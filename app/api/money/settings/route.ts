import { NextResponse } from "next/server";
import { route, parseJson } from "@/server/route";
import { requireUser } from "@/server/session";
import { getMoneySettings, saveMoneySettings } from "@/db/queries/money-settings";
import { moneySettingsSchema } from "./money-settings.schema";

export const GET = route(async () => {
  await requireUser("lead");
  return NextResponse.json({ settings: await getMoneySettings() });
});

export const PUT = route(async (req) => {
  const input = await parseJson(req, moneySettingsSchema);
  await requireUser("lead");
  return NextResponse.json({ settings: await saveMoneySettings(input) });
});
