import { NextResponse } from "next/server";

export const dynamic = "force-dynamic";

/** Liveness for load balancers and the scripts that wait for the server. */
export function GET() {
  return NextResponse.json({ ok: true });
}
