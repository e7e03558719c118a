"use client";
import { useId, useRef, useState } from "react";
import { buttonStyles } from "./button-styles";
import { PHOTO_ACCEPT, checkUpload } from "@/lib/install/upload-rules";

export type UploadedFile = { id: string; fileName: string; url: string; thumbUrl: string | null };

type Props = {
  projectId: string;
  stage: string;
  label?: string;
  caption?: string;
  isProblem?: boolean;
  /** Photos only, and the phone offers its camera first. */
  photoOnly?: boolean;
  onUploaded: (file: UploadedFile) => void;
  className?: string;
};

/**
 * Picks a file and sends it to the project's uploads route in one request. The file's type, size
 * and name are checked here first so a refusal is instant; the server checks them again.
 */
export function UploadButton({ projectId, stage, label = "Attach a photo", caption, isProblem, photoOnly = true, onUploaded, className }: Props) {
  const id = useId();
  const input = useRef<HTMLInputElement>(null);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  async function send(file: File) {
    setError(null);
    const check = checkUpload({ fileName: file.name, contentType: file.type, sizeBytes: file.size });
    if (!check.ok) {
      setError(check.message);
      return;
    }
    const form = new FormData();
    form.set("file", file);
    form.set("stage", stage);
    if (caption) form.set("caption", caption);
    if (isProblem) form.set("isProblem", "true");
    setBusy(true);
    try {
      const res = await fetch(`/api/projects/${projectId}/uploads`, { method: "POST", body: form });
      const data = await res.json().catch(() => null);
      if (!res.ok) {
        setError(data?.error ?? `The upload failed (${res.status}). Try again.`);
        return;
      }
      onUploaded(data.attachment);
    } catch {
      setError("No connection: the photo wasn't sent. Try again when you have signal; nothing else was lost.");
    } finally {
      setBusy(false);
      if (input.current) input.current.value = "";
    }
  }

  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className={`${buttonStyles.secondary} min-h-11 cursor-pointer ${busy ? "opacity-50" : ""} ${className ?? ""}`}>
        {busy ? "Uploading…" : label}
      </label>
      <input
        ref={input}
        id={id}
        type="file"
        className="sr-only"
        disabled={busy}
        accept={photoOnly ? PHOTO_ACCEPT : `${PHOTO_ACCEPT},application/pdf`}
        aria-describedby={error ? `${id}-error` : undefined}
        onChange={(e) => {
          const f = e.target.files?.[0];
          if (f) void send(f);
        }}
      />
      {error && (
        <p id={`${id}-error`} role="alert" className="text-xs font-medium text-danger">
          {error}
        </p>
      )}
    </div>
  );
}
