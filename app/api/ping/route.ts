import { NextResponse } from "next/server";
import { publicRoute } from "@/server/route";

export const dynamic = "force-dynamic";

const BODY = { ok: true, service: "tankwright" };

/** A constant answer: the benchmark's baseline for what the server costs before any real work. */
export const GET = publicRoute({}, () => NextResponse.json(BODY));
