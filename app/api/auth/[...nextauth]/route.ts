import NextAuth from "next-auth";
import { NextResponse } from "next/server";
import { authOptions } from "@/server/auth-options";
import { signInSchema } from "@/app/(auth)/sign-in/sign-in.schema";
import { fieldErrorsFromIssues } from "@/server/errors";

const handler = NextAuth(authOptions);

type Ctx = { params: Promise<{ nextauth: string[] }> };

/**
 * Checks a sign-in body before the auth library sees it, so a malformed or incomplete body gets a
 * 400 that says what is wrong instead of a crash or a misleading "wrong password".
 */
async function checkSignInBody(req: Request): Promise<Response | null> {
  const type = req.headers.get("content-type") ?? "";
  let body: unknown;
  try {
    const text = await req.clone().text();
    if (type.includes("application/json")) body = JSON.parse(text);
    else if (type.includes("application/x-www-form-urlencoded")) body = Object.fromEntries(new URLSearchParams(text));
    else return NextResponse.json({ error: "Send the sign-in form as form data or JSON." }, { status: 415 });
  } catch {
    return NextResponse.json({ error: "The sign-in request couldn't be read. Send an e-mail and a password." }, { status: 400 });
  }
  const parsed = signInSchema.safeParse(body);
  if (!parsed.success) {
    return NextResponse.json({ error: "Enter an e-mail address and a password.", fields: fieldErrorsFromIssues(parsed.error.issues) }, { status: 400 });
  }
  return null;
}

export { handler as GET };

export async function POST(req: Request, ctx: Ctx) {
  const { nextauth } = await ctx.params;
  if (nextauth.join("/") === "callback/credentials") {
    const refusal = await checkSignInBody(req);
    if (refusal) return refusal;
  }
  return handler(req, ctx);
}
