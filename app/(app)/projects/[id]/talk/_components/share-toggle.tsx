"use client";
import { useState, useTransition } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { buttonStyles } from "@/components/ui/button-styles";
import { delayWords, leavesAtSentence } from "@/lib/mail/notice-delay";

type Audience = { name: string; email: string }[];
type ShareAnswer = { shared: boolean; email: { to: string; leavesAt: string } | null; takenBack: boolean; alreadySent: boolean };

/**
 * Shares a note with the client only after saying exactly who will see it; the e-mail waits in
 * the outbox for the company's delay and can be taken back until it leaves.
 */
export function ShareToggle({
  projectId,
  noteId,
  shared,
  audience,
  delaySeconds,
  pendingSentence,
}: {
  projectId: string;
  noteId: string;
  shared: boolean;
  audience: Audience;
  delaySeconds: number;
  /** Set on the server when a shared note's e-mail has not left yet. */
  pendingSentence: string | null;
}) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const [asking, setAsking] = useState(false);
  const [message, setMessage] = useState<string | null>(pendingSentence);
  const [error, setError] = useState<string>();
  const names = audience.map((a) => a.name).join(" and ") || "the client";

  const send = (next: boolean) =>
    start(async () => {
      setError(undefined);
      const r = await sendJson<ShareAnswer>(`/api/projects/${projectId}/notes/${noteId}`, "PATCH", { shared: next });
      if (!r.ok) return setError(r.error);
      setAsking(false);
      if (r.data.shared) setMessage(r.data.email ? `Shared with ${r.data.email.to}. ${leavesAtSentence(r.data.email.leavesAt)}` : `Shared with ${names}; they have turned these e-mails off.`);
      else setMessage(r.data.takenBack ? "Taken back: the note is internal again and no e-mail was sent." : "The note is internal again. The e-mail had already left.");
      router.refresh();
    });

  return (
    <div className="mt-2 flex flex-col gap-2">
      {message && (
        <p role="status" className="text-xs text-muted" data-testid="share-status">
          {message}
        </p>
      )}
      {asking ? (
        <div role="group" aria-label="Share this note?" className="rounded-lg border border-caution/40 bg-caution-soft/40 p-3 text-sm" data-testid="share-confirm">
          <p className="font-semibold">Share this note with {names}?</p>
          <ul className="mt-1 list-disc pl-5 text-ink/80">
            {audience.map((a) => (
              <li key={a.email}>
                {a.name} ({a.email}) will see it on the project&apos;s timeline and get an e-mail.
              </li>
            ))}
          </ul>
          <p className="mt-1 text-xs text-muted">The e-mail waits {delayWords(delaySeconds)} in the outbox; you can take it back until it leaves.</p>
          <div className="mt-2 flex flex-wrap gap-2">
            <button type="button" className={buttonStyles.primary} disabled={pending} onClick={() => send(true)}>
              Share with {names}
            </button>
            <button type="button" className={buttonStyles.secondary} disabled={pending} onClick={() => setAsking(false)}>
              Keep it internal
            </button>
          </div>
        </div>
      ) : (
        <span className="flex items-center gap-2">
          <button type="button" className={buttonStyles.quiet} disabled={pending} onClick={() => (shared ? send(false) : setAsking(true))}>
            {shared ? (pendingSentence || message?.startsWith("Shared") ? "Take back" : "Make internal") : "Share with client…"}
          </button>
        </span>
      )}
      {error && (
        <span role="alert" className="text-xs text-danger">
          {error}
        </span>
      )}
    </div>
  );
}
