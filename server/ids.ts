import { AppError } from "./errors";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Validates a route parameter such as a project id. A malformed id is reported as not found. */
export function parseId(value: string, what = "That project"): string {
  if (!UUID.test(value)) throw new AppError(404, `${what} wasn't found, or you don't have access to it.`);
  return value.toLowerCase();
}
