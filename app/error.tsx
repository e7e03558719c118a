"use client";
import { buttonStyles } from "@/components/ui/button-styles";

export default function ErrorPage({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <main className="mx-auto flex min-h-[60vh] max-w-md flex-col items-center justify-center gap-4 px-6 text-center">
      <p className="text-sm font-semibold uppercase tracking-widest text-danger">Something went wrong</p>
      <h1 className="text-2xl font-bold">This page didn't load</h1>
      <p className="text-muted">
        Nothing you entered was lost. Try again; if it keeps happening, tell your project lead{error.digest ? ` and quote reference ${error.digest}` : ""}.
      </p>
      <button type="button" onClick={reset} className={buttonStyles.primary}>
        Try again
      </button>
    </main>
  );
}
