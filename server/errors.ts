/**
 * Failures a person can act on, each with the HTTP status it answers with. Anything else is a bug:
 * it is logged with an id and the person sees a calm message with that id.
 */
export type FieldErrors = Record<string, string>;

export class AppError extends Error {
  constructor(
    readonly status: 400 | 401 | 403 | 404 | 409 | 413 | 415 | 422 | 429 | 503,
    message: string,
    readonly fields?: FieldErrors,
    readonly extra?: Record<string, unknown>,
  ) {
    super(message);
  }
}

export const badRequest = (message: string, fields?: FieldErrors) => new AppError(400, message, fields);
export const unauthorized = (message = "Sign in to continue.") => new AppError(401, message);
export const forbidden = (message = "Your role can't do that on this project.") => new AppError(403, message);
export const notFound = (what = "That project") => new AppError(404, `${what} wasn't found, or you don't have access to it.`);
export const conflict = (message: string, extra?: Record<string, unknown>) => new AppError(409, message, undefined, extra);
export const unprocessable = (message: string, extra?: Record<string, unknown>) => new AppError(422, message, undefined, extra);

/** Field messages from a zod error, keyed by dotted path. */
export function fieldErrorsFromIssues(issues: { path: PropertyKey[]; message: string }[]): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of issues) {
    const key = issue.path.map(String).join(".") || "_";
    out[key] ??= issue.message;
  }
  return out;
}
