import { route } from "@/server/route";
import { revokeApproval } from "../revoke-approval";

/** Withdraws the load approval with a reason (the same as DELETE on the approval). */
export const POST = route<{ id: string }>(async (req, ctx) => revokeApproval(req, ctx));
