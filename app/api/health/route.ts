import { NextResponse } from "next/server";
import { publicRoute } from "@/server/route";

export const dynamic = "force-dynamic";

/** Liveness for load balancers and the scripts that wait for the server. */
export const GET = publicRoute({}, () => NextResponse.json({ ok: true }));
