"use client";
import { useState, useTransition } from "react";
import { sendJson } from "@/lib/http/send-json";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";

/** The personal calendar-feed address; making a new one revokes the old. */
export function CalendarFeed({ initialUrl }: { initialUrl: string | null }) {
  const [url, setUrl] = useState(initialUrl);
  const [error, setError] = useState<string>();
  const [pending, start] = useTransition();
  return (
    <section className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-5" aria-labelledby="calendar-heading">
      <h2 id="calendar-heading" className="text-lg font-semibold">
        Calendar feed
      </h2>
      <p className="text-sm text-muted">Subscribe to this address in your calendar app to see install days and visits on your projects. Anyone with the address can read it; make a new one to stop the old one working.</p>
      {url && (
        <>
          <label htmlFor="calendar-url" className="text-sm font-medium">
            Your feed address
          </label>
          <input id="calendar-url" readOnly value={url} className={inputStyles} onFocus={(e) => e.currentTarget.select()} />
        </>
      )}
      <div className="flex items-center gap-3">
        <button
          type="button"
          className={buttonStyles.secondary}
          disabled={pending}
          onClick={() =>
            start(async () => {
              const r = await sendJson<{ url: string }>("/api/calendar/token", "POST");
              if (r.ok) {
                setUrl(r.data.url);
                setError(undefined);
              } else setError(r.error);
            })
          }
        >
          {url ? "Make a new address (revokes this one)" : "Create my feed address"}
        </button>
        {error && <p role="alert" className="text-sm text-danger">{error}</p>}
      </div>
    </section>
  );
}
