import { NextResponse } from "next/server";
import { projectRoute } from "@/server/route";
import { getLivestock } from "@/db/queries/livestock";

/** The tank's fish: groups, census, growth and history. Everyone on the project may read it. */
export const GET = projectRoute({ action: "view_livestock" }, async ({ project }) => NextResponse.json(await getLivestock(project.id)));
