import { pgEnum } from "drizzle-orm/pg-core";
import { STAGES } from "../../lib/stages/stages";
import { ROLES } from "../../lib/auth/roles";

export const roleEnum = pgEnum("role", ROLES);
export const stageEnum = pgEnum("stage", STAGES);
