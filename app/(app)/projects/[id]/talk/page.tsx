import type { Metadata } from "next";
import { format } from "date-fns";
import { requirePageUser } from "@/server/session";
import { projectSectionTitle, requirePageProject } from "@/server/page-project";
import { listMessages } from "@/db/queries/messages";
import { listNotes, noteAudience, pendingNoteEmails } from "@/db/queries/notes";
import { db } from "@/db";
import { markMessagesRead } from "@/db/queries/message-reads";
import { noticeDelaySeconds } from "@/db/queries/outbox";
import { leavesAtSentence } from "@/lib/mail/notice-delay";
import { ROLE_LABELS } from "@/lib/auth/roles";
import { MessageForm } from "./_components/message-form";
import { NoteForm } from "./_components/note-form";
import { ShareToggle } from "./_components/share-toggle";

export const generateMetadata = ({ params }: { params: Promise<{ id: string }> }): Promise<Metadata> => projectSectionTitle(params, "Messages & notes");
export const dynamic = "force-dynamic";

export default async function TalkPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requirePageUser();
  const { project } = await requirePageProject(id, user);
  const isClient = user.role === "client";
  // The filter is in the query's `where`: a client's page never loads an internal note.
  const isLead = user.role === "lead";
  // Opening the page reads the messages: the board's and the navigation's unread counts drop.
  if (!isClient) await markMessagesRead(user.id, project.id);
  const [messages, notes, audience, pendingEmails, delaySeconds] = await Promise.all([
    listMessages(project.id),
    listNotes(project.id, { sharedOnly: isClient }),
    isLead ? noteAudience(project) : [],
    isLead ? pendingNoteEmails(project.id) : new Map<string, Date>(),
    isLead ? noticeDelaySeconds(db()) : 0,
  ]);
  return (
    <div className="grid gap-6 lg:grid-cols-[3fr_2fr]">
      <section aria-labelledby="messages-heading" className="flex flex-col gap-3">
        <h2 id="messages-heading" className="text-lg font-semibold">
          Messages
        </h2>
        <p className="text-sm text-muted">{isClient ? "Write to your project team; the project lead is e-mailed and answers here." : "Messages with the client. Everyone on the project sees them."}</p>
        {messages.length === 0 ? (
          <p className="text-sm text-muted">No messages yet.</p>
        ) : (
          <ol className="flex flex-col gap-2" data-testid="message-list">
            {messages.map((m) => (
              <li key={m.id} className={`rounded-lg border border-line px-3 py-2 text-sm ${m.authorId === user.id ? "bg-accent-soft/50" : "bg-card"}`}>
                <p className="flex flex-wrap gap-x-2 text-xs text-muted">
                  <span className="font-semibold text-ink">{m.authorName}</span>
                  <span>{ROLE_LABELS[m.authorRole]}</span>
                  <time dateTime={m.createdAt.toISOString()}>{format(m.createdAt, "d MMM yyyy, HH:mm")}</time>
                </p>
                <p className="mt-1 whitespace-pre-wrap">{m.body}</p>
              </li>
            ))}
          </ol>
        )}
        <MessageForm projectId={project.id} to={isClient ? "The project lead" : "The client"} />
      </section>
      <section aria-labelledby="notes-heading" className="flex flex-col gap-3">
        <h2 id="notes-heading" className="text-lg font-semibold">
          {isClient ? "Notes from your project team" : "Notes"}
        </h2>
        {!isClient && <p className="text-sm text-muted">Internal notes stay with the team; shared ones appear on the client's timeline.</p>}
        {notes.length === 0 ? (
          <p className="text-sm text-muted">No notes yet.</p>
        ) : (
          <ol className="flex flex-col gap-2" data-testid="note-list">
            {notes.map((n) => (
              <li key={n.id} className="rounded-lg border border-line bg-card px-3 py-2 text-sm">
                <p className="flex flex-wrap items-center gap-x-2 text-xs text-muted">
                  <span className="font-semibold text-ink">{n.authorName}</span>
                  <time dateTime={n.createdAt.toISOString()}>{format(n.createdAt, "d MMM yyyy, HH:mm")}</time>
                  {!isClient && (
                    <span className={`rounded px-1.5 py-0.5 font-semibold ${n.shared ? "bg-ok-soft text-ok" : "bg-paper text-muted"}`}>{n.shared ? "Shared with client" : "Internal"}</span>
                  )}
                </p>
                <p className="mt-1 whitespace-pre-wrap">{n.body}</p>
                {isLead && (
                  <ShareToggle
                    projectId={project.id}
                    noteId={n.id}
                    shared={n.shared}
                    audience={audience}
                    delaySeconds={delaySeconds}
                    pendingSentence={n.shared && pendingEmails.has(n.id) ? leavesAtSentence(pendingEmails.get(n.id)!) : null}
                  />
                )}
              </li>
            ))}
          </ol>
        )}
        {isLead && <NoteForm projectId={project.id} audience={audience} delaySeconds={delaySeconds} />}
      </section>
    </div>
  );
}
