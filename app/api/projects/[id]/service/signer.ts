import type { Relation } from "@/lib/auth/permissions";
import type { Signer } from "@/lib/service/sign-off";

/** The caller as the sign-off rules see them. */
export function signerOf(relation: Relation): Signer {
  return { role: relation.role, assigned: relation.assigned };
}
