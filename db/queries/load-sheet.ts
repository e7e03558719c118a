import "server-only";
import { eq } from "drizzle-orm";
import { db } from "../index";
import { company, users } from "../schema";

/** What the load-check sheet's heading names besides the project: the company and the client. */
export async function getSheetParties(clientId: string) {
  const [[firm], [client]] = await Promise.all([
    db().select({ name: company.name, email: company.email, phone: company.phone }).from(company).limit(1),
    db().select({ name: users.name, email: users.email }).from(users).where(eq(users.id, clientId)),
  ]);
  return { company: firm ?? null, client: client ?? null };
}
