import NextAuth from "next-auth";
import { NextResponse } from "next/server";
import { authOptions } from "@/server/auth-options";
import { signInSchema } from "@/app/(auth)/sign-in/sign-in.schema";
import { THROTTLED_CODE, throttledMessage } from "@/app/(auth)/sign-in/sign-in-messages";
import { fieldErrorsFromIssues } from "@/server/errors";
import { recordFailure, recordSuccess, secondsUntilAllowed, signInAttempt } from "@/server/sign-in-throttle";
import { publicUrl } from "@/env";

const handler = NextAuth(authOptions);

type Ctx = { params: Promise<{ nextauth: string[] }> };

/**
 * Checks a sign-in body before the auth library sees it, so a malformed or incomplete body gets a
 * 400 that says what is wrong instead of a crash or a misleading "wrong password".
 */
async function readSignInBody(req: Request): Promise<{ refusal: Response } | { email: string }> {
  const type = req.headers.get("content-type") ?? "";
  let body: unknown;
  try {
    const text = await req.clone().text();
    if (type.includes("application/json")) body = JSON.parse(text);
    else if (type.includes("application/x-www-form-urlencoded")) body = Object.fromEntries(new URLSearchParams(text));
    else return { refusal: NextResponse.json({ error: "Send the sign-in form as form data or JSON." }, { status: 415 }) };
  } catch {
    return { refusal: NextResponse.json({ error: "The sign-in request couldn't be read. Send an e-mail and a password." }, { status: 400 }) };
  }
  const parsed = signInSchema.safeParse(body);
  if (!parsed.success) {
    return { refusal: NextResponse.json({ error: "Enter an e-mail address and a password.", fields: fieldErrorsFromIssues(parsed.error.issues) }, { status: 400 }) };
  }
  return { email: parsed.data.email };
}

/** 429 with Retry-After; `url` carries the code the next-auth client reads back as the error. */
function throttled(seconds: number): Response {
  const url = new URL("/sign-in", publicUrl());
  url.searchParams.set("error", `${THROTTLED_CODE}.${seconds}`);
  return NextResponse.json({ error: throttledMessage(seconds), retryAfter: seconds, url: url.toString() }, { status: 429, headers: { "Retry-After": String(seconds) } });
}

/** Throttled sign-in: refused before any password is checked while paused; each wrong answer counted. */
async function credentialsSignIn(req: Request, ctx: Ctx): Promise<Response> {
  const body = await readSignInBody(req);
  if ("refusal" in body) return body.refusal;
  const attempt = signInAttempt(body.email, req.headers);
  const wait = await secondsUntilAllowed(attempt);
  if (wait > 0) return throttled(wait);
  const res: Response = await handler(req, ctx);
  const signedIn = res.headers.getSetCookie().some((c: string) => /next-auth\.session-token=[^;]/.test(c));
  if (signedIn) await recordSuccess(attempt);
  else if (res.status === 401 || /[?&]error=/.test(res.headers.get("location") ?? "")) await recordFailure(attempt);
  return res;
}

export { handler as GET };

export async function POST(req: Request, ctx: Ctx) {
  const { nextauth } = await ctx.params;
  if (nextauth.join("/") === "callback/credentials") return credentialsSignIn(req, ctx);
  return handler(req, ctx);
}
