import "server-only";
import { asc, eq } from "drizzle-orm";
import { db } from "../index";
import { messages, users } from "../schema";
import type { ProjectRow } from "./project-access";
import { companyName, enqueueNotice } from "./outbox";
import { messageEmail } from "../../lib/mail/message-email";
import type { Role } from "../../lib/auth/roles";
import { env } from "../../env";

export type MessageView = { id: string; body: string; createdAt: Date; authorId: string; authorName: string; authorRole: Role };

/** A project's messages, oldest first (newest last, as a conversation reads). */
export async function listMessages(projectId: string): Promise<MessageView[]> {
  return db()
    .select({ id: messages.id, body: messages.body, createdAt: messages.createdAt, authorId: messages.authorId, authorName: users.name, authorRole: users.role })
    .from(messages)
    .innerJoin(users, eq(users.id, messages.authorId))
    .where(eq(messages.projectId, projectId))
    .orderBy(asc(messages.createdAt), asc(messages.id));
}

/**
 * Posts a message and queues its e-mail in the same transaction: a client's message goes to the
 * project's lead (every lead when the project has none yet); staff messages go to the client.
 */
export async function postMessage(opts: { project: ProjectRow; author: { id: string; name: string; role: Role }; body: string }) {
  return db().transaction(async (tx) => {
    const [message] = await tx.insert(messages).values({ projectId: opts.project.id, authorId: opts.author.id, body: opts.body }).returning();
    let recipients: { id: string; name: string; email: string }[];
    const pick = { id: users.id, name: users.name, email: users.email };
    if (opts.author.role === "client") {
      recipients = opts.project.leadId
        ? await tx.select(pick).from(users).where(eq(users.id, opts.project.leadId))
        : await tx.select(pick).from(users).where(eq(users.role, "lead"));
    } else {
      recipients = await tx.select(pick).from(users).where(eq(users.id, opts.project.clientId));
    }
    const company = await companyName(tx);
    for (const r of recipients) {
      if (r.id === opts.author.id) continue;
      const email = messageEmail({
        companyName: company,
        recipientName: r.name,
        projectTitle: opts.project.title,
        authorName: opts.author.name,
        body: opts.body,
        url: `${env().APP_URL}/projects/${opts.project.id}/talk`,
      });
      await enqueueNotice(tx, { kind: "message", projectId: opts.project.id, recipientId: r.id, toEmail: r.email, email });
    }
    return message;
  });
}
