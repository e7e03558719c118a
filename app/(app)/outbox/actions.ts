"use server";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { action } from "@/server/action";
import { db } from "@/db";
import { retryNotices } from "@/db/queries/outbox";

export const retryNoticesAction = action(
  { schema: z.object({ ids: z.array(z.string().uuid()).min(1, "Choose at least one notice.").max(200) }), roles: ["lead"] },
  async (input) => {
    const count = await retryNotices(db(), input.ids);
    revalidatePath("/outbox");
    return { count };
  },
);
