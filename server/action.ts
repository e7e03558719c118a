import "server-only";
import type { z } from "zod";
import { AppError, fieldErrorsFromIssues, type FieldErrors } from "./errors";
import { requireUser, type SessionUser } from "./session";
import { projectFor } from "./route";
import type { ProjectRow } from "../db/queries/project-access";
import type { ProjectAction, Relation } from "../lib/auth/permissions";
import type { Role } from "../lib/auth/roles";

export type ActionResult<T = unknown> = { ok: true; data: T } | { ok: false; error: string; fields?: FieldErrors; status: number };

const CHECKED = Symbol.for("tankwright.checked-action");

/**
 * A server action for signed-in people: the same order as a route (401, then 403 for a role not
 * in `roles`, then 400 for the input). Failures come back as data, never as thrown errors.
 */
export function action<S extends z.ZodType, T>(opts: { schema: S; roles?: Role[] }, run: (input: z.infer<S>, user: SessionUser) => Promise<T>) {
  return guarded(async (raw) => {
    const user = await requireUser(...(opts.roles ?? []));
    return run(parse(opts.schema, raw), user);
  });
}

/**
 * A server action about one project: the input carries `projectId`; 401, then 404 when the caller
 * may not see the project, 403 when they may not do `action` on it, then 400 for the rest.
 */
export function projectAction<S extends z.ZodType, T>(
  opts: { schema: S; action: ProjectAction },
  run: (ctx: { input: z.infer<S>; user: SessionUser; project: ProjectRow; relation: Relation }) => Promise<T>,
) {
  return guarded(async (raw) => {
    const user = await requireUser();
    const projectId = raw && typeof raw === "object" && "projectId" in raw ? String((raw as { projectId: unknown }).projectId) : "";
    const { project, relation } = await projectFor(projectId, user, opts.action);
    return run({ input: parse(opts.schema, raw), user, project, relation });
  });
}

/** True for an action built above; the route walker test checks every "use server" export with it. */
export function isCheckedAction(fn: unknown): boolean {
  return typeof fn === "function" && (fn as { [CHECKED]?: true })[CHECKED] === true;
}

function parse<S extends z.ZodType>(schema: S, raw: unknown): z.infer<S> {
  const parsed = schema.safeParse(raw);
  if (!parsed.success) throw new AppError(400, "Some fields need attention.", fieldErrorsFromIssues(parsed.error.issues));
  return parsed.data;
}

function guarded<T>(run: (raw: unknown) => Promise<T>) {
  const fn = async (raw: unknown): Promise<ActionResult<T>> => {
    try {
      return { ok: true, data: await run(raw) };
    } catch (error) {
      if (error instanceof AppError) return { ok: false, status: error.status, error: error.message, fields: error.fields };
      const id = crypto.randomUUID().slice(0, 8);
      console.error(`[error ${id}]`, error);
      return { ok: false, status: 500, error: `Something went wrong on our side (reference ${id}). Try again in a moment.` };
    }
  };
  return Object.assign(fn, { [CHECKED]: true as const });
}
