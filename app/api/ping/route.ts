import { NextResponse } from "next/server";

export const dynamic = "force-dynamic";

const BODY = { ok: true, service: "tankwright" };

/** A constant answer: the benchmark's baseline for what the server costs before any real work. */
export function GET() {
  return NextResponse.json(BODY);
}
