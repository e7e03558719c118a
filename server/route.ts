import "server-only";
import { NextResponse } from "next/server";
import { ZodError, type z } from "zod";
import { AppError, forbidden, fieldErrorsFromIssues, notFound } from "./errors";
import { JSON_BODY_LIMIT, checkDeclaredLength, parseFormBytes, parseJsonBytes, readLimitedBody } from "./body";
import { checkContentType, checkOrigin, isMutating, type BodyKind } from "./origin";
import { requireUser, type SessionUser } from "./session";
import { loadProjectRelation, type ProjectRow } from "../db/queries/project-access";
import { canOnProject, canSeeProject, type ProjectAction, type Relation } from "../lib/auth/permissions";
import type { Role } from "../lib/auth/roles";
import { parseId } from "./ids";
import { serverTimingHeader, timed, withTiming } from "./timing";

export { parseId };

export type RouteContext<P> = { params: Promise<P> };
type Params = Record<string, string | string[]>;
type Handler<P> = ((req: Request, ctx: RouteContext<P>) => Promise<Response>) & { readonly [CHECKED]: RouteAccess };

const CHECKED = Symbol.for("tankwright.checked-route");

/** What a wrapper checks before the handler runs; tests read it to know what each caller must get. */
export type RouteAccess = { schema: z.ZodType | null; multipart: boolean } & (
  | { kind: "public" }
  | { kind: "user"; roles: Role[] }
  | { kind: "project"; action: ProjectAction }
);

/**
 * What a route reads besides the session. `schema` checks the body (JSON, or the fields that
 * `multipart.toInput` takes from a form), `query` the search parameters. Bodies are refused past
 * `limit` bytes (JSON_BODY_LIMIT unless a multipart route sets its own).
 */
export type InputOptions<S extends z.ZodType | undefined, Q extends z.ZodType | undefined> = {
  schema?: S;
  query?: Q;
  limit?: number;
  multipart?: { limit: number; toInput: (form: FormData) => unknown };
};

type Parsed<S> = S extends z.ZodType ? z.infer<S> : undefined;

export type PublicContext<S, Q, P> = { req: Request; input: Parsed<S>; query: Parsed<Q>; params: P; form: FormData | null };
export type UserContext<S, Q, P> = PublicContext<S, Q, P> & { user: SessionUser };
export type ProjectContext<S, Q, P> = UserContext<S, Q, P> & { project: ProjectRow; relation: Relation };

/**
 * A route anyone may call (the token is the credential, or nothing is private). It still gets the
 * origin, type and size checks and the same input parsing.
 */
export function publicRoute<S extends z.ZodType | undefined = undefined, Q extends z.ZodType | undefined = undefined, P = Params>(
  opts: InputOptions<S, Q>,
  handler: (ctx: PublicContext<S, Q, P>) => Promise<Response> | Response,
): Handler<P> {
  return checked<P>(opts, { kind: "public" }, async (req, params) => {
    const parsed = await readInput(req, opts);
    return handler({ req, params, ...parsed } as PublicContext<S, Q, P>);
  });
}

/** A route for signed-in people, optionally only some roles: 401, then 403, then 400. */
export function userRoute<S extends z.ZodType | undefined = undefined, Q extends z.ZodType | undefined = undefined, P = Params>(
  opts: InputOptions<S, Q> & { roles?: Role[] },
  handler: (ctx: UserContext<S, Q, P>) => Promise<Response>,
): Handler<P> {
  return checked<P>(opts, { kind: "user", roles: opts.roles ?? [] }, async (req, params) => {
    // With BENCH_TIMING set, the answer says where its time went (server/timing.ts); otherwise this is a plain call.
    const { result, parts } = await withTiming(async () => {
      const user = await timed("session", () => requireUser(...(opts.roles ?? [])));
      const parsed = await readInput(req, opts);
      return timed("handler", () => handler({ req, params, user, ...parsed } as UserContext<S, Q, P>));
    });
    if (parts) result.headers.set("server-timing", serverTimingHeader(parts));
    return result;
  });
}

/**
 * A route about one project, `[id]` in its path: 401 without a session, 404 when the caller may not
 * see the project (its existence isn't revealed), 403 when they may see it but not do `action`,
 * then 400 for the body or query, then the handler with the project and the caller's relation.
 */
export function projectRoute<S extends z.ZodType | undefined = undefined, Q extends z.ZodType | undefined = undefined, P extends { id: string } = { id: string }>(
  opts: InputOptions<S, Q> & { action: ProjectAction; notFoundAs?: string },
  handler: (ctx: ProjectContext<S, Q, P>) => Promise<Response>,
): Handler<P> {
  return checked<P>(opts, { kind: "project", action: opts.action }, async (req, params) => {
    const user = await requireUser();
    const { project, relation } = await projectFor(params.id, user, opts.action, opts.notFoundAs);
    const parsed = await readInput(req, opts);
    return handler({ req, params, user, project, relation, ...parsed } as ProjectContext<S, Q, P>);
  });
}

/** The project and relation, or 404 / 403 in that order. */
export async function projectFor(projectId: string, user: SessionUser, action: ProjectAction, what?: string) {
  const found = await loadProjectRelation(parseId(projectId, what), user);
  if (!found || !canSeeProject(found.relation)) throw notFound(what);
  if (!canOnProject(found.relation, action)) throw forbidden();
  return found;
}

/** For a handler whose second action depends on the (already valid) body, such as an untick. */
export function requireAction(relation: Relation, action: ProjectAction, message?: string) {
  if (!canOnProject(relation, action)) throw forbidden(message);
}

/** What the wrapper that made `fn` checks, or null for a function no wrapper made. */
export function routeAccess(fn: unknown): RouteAccess | null {
  return typeof fn === "function" ? ((fn as Partial<Handler<unknown>>)[CHECKED] ?? null) : null;
}

/** True for a handler made by one of the wrappers above; the route walker test relies on it. */
export function isCheckedRoute(fn: unknown): boolean {
  return routeAccess(fn) !== null;
}

type AccessKind = { kind: "public" } | { kind: "user"; roles: Role[] } | { kind: "project"; action: ProjectAction };

function checked<P>(
  opts: InputOptions<z.ZodType | undefined, z.ZodType | undefined>,
  kind: AccessKind,
  run: (req: Request, params: P) => Promise<Response>,
): Handler<P> {
  const fn = async (req: Request, ctx: RouteContext<P>): Promise<Response> => {
    try {
      if (isMutating(req.method)) {
        checkOrigin(req);
        checkDeclaredLength(req, bodyLimit(opts));
      }
      return await run(req, ((await ctx?.params) ?? {}) as P);
    } catch (error) {
      return errorResponse(error);
    }
  };
  const access: RouteAccess = { ...kind, schema: opts.schema ?? null, multipart: Boolean(opts.multipart) };
  return Object.assign(fn, { [CHECKED]: access });
}

function bodyLimit(opts: InputOptions<z.ZodType | undefined, z.ZodType | undefined>) {
  return Math.max(opts.limit ?? JSON_BODY_LIMIT, opts.multipart?.limit ?? 0);
}

async function readInput(req: Request, opts: InputOptions<z.ZodType | undefined, z.ZodType | undefined>) {
  let query: unknown;
  if (opts.query) query = check(opts.query, Object.fromEntries(new URL(req.url).searchParams));
  let input: unknown;
  let form: FormData | null = null;
  if (isMutating(req.method)) {
    const accepts: BodyKind[] = opts.multipart ? ["json", "multipart"] : ["json"];
    const kind = checkContentType(req, accepts, Boolean(opts.schema));
    if (opts.schema && kind === "multipart" && opts.multipart) {
      const bytes = await readLimitedBody(req, opts.multipart.limit);
      form = await parseFormBytes(bytes, req.headers.get("content-type") ?? "");
      input = check(opts.schema, opts.multipart.toInput(form));
    } else if (opts.schema) {
      input = check(opts.schema, parseJsonBytes(await readLimitedBody(req, opts.limit ?? JSON_BODY_LIMIT)));
    }
  }
  return { input, query, form };
}

function check(schema: z.ZodType, value: unknown): unknown {
  const parsed = schema.safeParse(value);
  if (!parsed.success) throw new AppError(400, "Some fields need attention.", fieldErrorsFromIssues(parsed.error.issues));
  return parsed.data;
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
