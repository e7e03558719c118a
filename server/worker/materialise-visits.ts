import type { Task } from "graphile-worker";
import { materialiseAllPlans } from "../../db/queries/service-plans";

/**
 * Tops up every live service plan's coming visits (the next weeks as rows). Inserts are keyed by
 * (plan, series date), so two workers running it at once, or a rerun, add nothing twice.
 */
export const materialiseServiceVisits: Task = async (_payload, helpers) => {
  const added = await materialiseAllPlans(new Date());
  if (added) helpers.logger.info(`service plans: ${added} visit(s) added`);
};
