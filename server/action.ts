import "server-only";
import type { z } from "zod";
import { AppError, fieldErrorsFromIssues, type FieldErrors } from "./errors";
import { requireUser, type SessionUser } from "./session";
import type { Role } from "../lib/auth/roles";

export type ActionResult<T = unknown> = { ok: true; data: T } | { ok: false; error: string; fields?: FieldErrors; status: number };

/**
 * Builds a server action that always parses its input, then checks the session and role, before
 * running. No action can skip the check, and failures come back as data, not thrown errors.
 */
export function action<S extends z.ZodType, T>(
  opts: { schema: S; roles: Role[] },
  run: (input: z.infer<S>, user: SessionUser) => Promise<T>,
) {
  return guarded(opts.schema, async (input) => run(input, await requireUser(...opts.roles)));
}

function guarded<S extends z.ZodType, T>(schema: S, run: (input: z.infer<S>) => Promise<T>) {
  return async (raw: unknown): Promise<ActionResult<T>> => {
    try {
      const parsed = schema.safeParse(raw);
      if (!parsed.success) {
        return { ok: false, status: 400, error: "Some fields need attention.", fields: fieldErrorsFromIssues(parsed.error.issues) };
      }
      return { ok: true, data: await run(parsed.data) };
    } catch (error) {
      if (error instanceof AppError) return { ok: false, status: error.status, error: error.message, fields: error.fields };
      const id = crypto.randomUUID().slice(0, 8);
      console.error(`[error ${id}]`, error);
      return { ok: false, status: 500, error: `Something went wrong on our side (reference ${id}). Try again in a moment.` };
    }
  };
}
