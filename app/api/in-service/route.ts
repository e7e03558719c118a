import { NextResponse } from "next/server";
import { userRoute } from "@/server/route";
import { listInService } from "@/db/queries/in-service";
import { IN_SERVICE_PAGE_SIZE, inServiceQuerySchema } from "./in-service.schema";

export const dynamic = "force-dynamic";

/** Every tank in service the caller may see, newest handover first, a page at a time, searchable. */
export const GET = userRoute({ roles: ["lead", "crew"], query: inServiceQuerySchema }, async ({ user, query }) => {
  return NextResponse.json(await listInService({ user, q: query.q, page: query.page, pageSize: IN_SERVICE_PAGE_SIZE }), { headers: { "cache-control": "no-store" } });
});
