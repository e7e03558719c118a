import "server-only";
import { NextResponse } from "next/server";
import { ZodError, type z } from "zod";
import { AppError, fieldErrorsFromIssues } from "./errors";

export type RouteContext<P> = { params: Promise<P> };

/**
 * Wraps a route handler so every failure answers with a status and a sentence a person can act
 * on. Unexpected errors are logged with an id; the response carries only the id.
 */
export function route<P = Record<string, string>>(handler: (req: Request, ctx: RouteContext<P>) => Promise<Response>) {
  return async (req: Request, ctx: RouteContext<P>): Promise<Response> => {
    try {
      return await handler(req, ctx);
    } catch (error) {
      return errorResponse(error);
    }
  };
}

export function errorResponse(error: unknown): Response {
  if (error instanceof AppError) {
    return NextResponse.json({ error: error.message, fields: error.fields, ...error.extra }, { status: error.status });
  }
  if (error instanceof ZodError) {
    return NextResponse.json({ error: "Some fields need attention.", fields: fieldErrorsFromIssues(error.issues) }, { status: 400 });
  }
  const id = crypto.randomUUID().slice(0, 8);
  console.error(`[error ${id}]`, error);
  return NextResponse.json({ error: `Something went wrong on our side (reference ${id}). Try again in a moment.` }, { status: 500 });
}

/** Reads and validates a JSON body; a malformed body is a 400, never a crash. */
export async function parseJson<S extends z.ZodType>(req: Request, schema: S): Promise<z.infer<S>> {
  let body: unknown;
  try {
    body = await req.json();
  } catch {
    throw new AppError(400, "The request body must be JSON.");
  }
  const parsed = schema.safeParse(body);
  if (!parsed.success) throw new AppError(400, "Some fields need attention.", fieldErrorsFromIssues(parsed.error.issues));
  return parsed.data;
}

/** Validates a route parameter such as a project id. A malformed id is reported as not found. */
export function parseId(value: string, what = "That project"): string {
  if (!/^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i.test(value)) {
    throw new AppError(404, `${what} wasn't found, or you don't have access to it.`);
  }
  return value.toLowerCase();
}
