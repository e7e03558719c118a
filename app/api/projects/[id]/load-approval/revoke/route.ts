import { revokeApproval } from "../revoke-approval";

/** Withdraws the load approval with a reason (the same as DELETE on the approval). */
export const POST = revokeApproval;
