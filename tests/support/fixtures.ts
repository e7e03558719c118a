/** Test data written straight to the test database: each test makes its own people and projects. */
import { randomUUID } from "node:crypto";
import { hashPassword } from "@/lib/auth/passwords";
import { generateKeyBetween } from "fractional-indexing";
import { and, desc, eq } from "drizzle-orm";
import { db } from "@/db";
import { projectCrew, projects, users } from "@/db/schema";
import type { Role } from "@/lib/auth/roles";
import type { Stage } from "@/lib/stages/stages";

export const PASSWORD = "fixture-password-1";
let hash: string | null = null;

export async function makeUser(role: Role, name = `${role} ${randomUUID().slice(0, 6)}`) {
  // A cheap scrypt cost keeps the many test sign-ins quick; the stored cost is what gets checked.
  hash ??= await hashPassword(PASSWORD, { log2N: 10, r: 8, p: 1 });
  const email = `${role}-${randomUUID().slice(0, 8)}@fixture.test`;
  const [user] = await db().insert(users).values({ name, email, role, passwordHash: hash }).returning();
  return user;
}

export async function makeProject(opts: { client: { id: string }; lead?: { id: string }; crew?: { id: string }[]; stage?: Stage; title?: string }) {
  const stage = opts.stage ?? "site_survey";
  const [last] = await db().select({ position: projects.position }).from(projects).where(eq(projects.stage, stage)).orderBy(desc(projects.position)).limit(1);
  const [project] = await db()
    .insert(projects)
    .values({
      title: opts.title ?? `Fixture tank ${randomUUID().slice(0, 6)}`,
      clientId: opts.client.id,
      leadId: opts.lead?.id ?? null,
      siteAddress: "1 Test Row, Testbury",
      siteTown: "Testbury",
      stage,
      position: generateKeyBetween(last?.position ?? null, null),
    })
    .returning();
  if (opts.crew?.length) await db().insert(projectCrew).values(opts.crew.map((c) => ({ projectId: project.id, userId: c.id })));
  return project;
}

/** A lead, two crew (one assigned), two clients (one owning the project) and the project. */
export async function makeTeam(stage: Stage = "site_survey") {
  const [lead, crew, otherCrew, client, otherClient] = await Promise.all([
    makeUser("lead"),
    makeUser("crew"),
    makeUser("crew"),
    makeUser("client"),
    makeUser("client"),
  ]);
  const project = await makeProject({ client, lead, crew: [crew], stage });
  return { lead, crew, otherCrew, client, otherClient, project };
}

export async function getProject(id: string) {
  const [p] = await db().select().from(projects).where(and(eq(projects.id, id)));
  return p;
}
