import { NextResponse } from "next/server";
import { userRoute } from "@/server/route";
import { getServiceTaskTemplate, setServiceTaskTemplate } from "@/db/queries/service-plans";
import { serviceTasksSchema } from "./service-tasks.schema";

export const GET = userRoute({ roles: ["lead"] }, async () => NextResponse.json({ tasks: await getServiceTaskTemplate() }));

/** The lead's template for a routine visit; plans already made keep their own copy. */
export const PUT = userRoute({ roles: ["lead"], schema: serviceTasksSchema }, async ({ input }) => {
  await setServiceTaskTemplate(input.tasks);
  return NextResponse.json({ tasks: await getServiceTaskTemplate() });
});
