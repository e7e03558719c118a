import { NextResponse } from "next/server";
import { parseId, userRoute } from "@/server/route";
import { forgetAccount } from "@/server/account-cache";
import { AppError } from "@/server/errors";
import { setPersonAccess } from "@/db/queries/sessions";
import { personAccessSchema } from "./person-access.schema";

/**
 * Changes a person's role or deactivates them; takes effect on their next request (on other app
 * instances within a few seconds). A lead can't change their own access, so the company always
 * keeps someone who can undo a mistake.
 */
export const PATCH = userRoute<typeof personAccessSchema, undefined, { id: string }>(
  { roles: ["lead"], schema: personAccessSchema },
  async ({ input, user, params }) => {
    const id = parseId(params.id, "That person");
    if (id === user.id) throw new AppError(409, "You can't change your own role or deactivate yourself; ask another project lead.");
    const person = await setPersonAccess(id, input);
    if (!person) throw new AppError(404, "That person wasn't found.");
    forgetAccount(id);
    return NextResponse.json(person);
  },
);
