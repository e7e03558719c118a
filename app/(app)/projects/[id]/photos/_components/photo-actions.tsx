"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { sendJson } from "@/lib/http/send-json";
import { buttonStyles, inputStyles } from "@/components/ui/button-styles";
import { VoidButton } from "@/app/(app)/projects/[id]/water/_components/void-button";

/** Corrections to a photo: a new caption (lead or uploader) and voiding with a reason (lead). */
export function PhotoActions({ projectId, photoId, caption, canCaption, canVoid }: { projectId: string; photoId: string; caption: string | null; canCaption: boolean; canVoid: boolean }) {
  const router = useRouter();
  const [editing, setEditing] = useState(false);
  const [text, setText] = useState(caption ?? "");
  const [error, setError] = useState<string | null>(null);
  const save = async () => {
    const r = await sendJson(`/api/projects/${projectId}/uploads/${photoId}`, "PATCH", { caption: text });
    if (!r.ok) return setError(r.fields?.caption ?? r.error);
    setEditing(false);
    router.refresh();
  };
  return (
    <div className="flex flex-col gap-1">
      {editing ? (
        <div className="flex flex-col gap-1">
          <label htmlFor={`caption-${photoId}`} className="font-medium">
            Caption
          </label>
          <input id={`caption-${photoId}`} className={inputStyles} value={text} onChange={(e) => setText(e.target.value)} aria-invalid={!!error} />
          {error && (
            <p role="alert" className="text-danger">
              {error}
            </p>
          )}
          <div className="flex gap-2">
            <button type="button" className={buttonStyles.secondary} onClick={save}>
              Save caption
            </button>
            <button type="button" className={buttonStyles.quiet} onClick={() => setEditing(false)}>
              Cancel
            </button>
          </div>
        </div>
      ) : (
        <div className="flex flex-wrap gap-3">
          {canCaption && (
            <button type="button" className={buttonStyles.quiet} onClick={() => setEditing(true)}>
              {caption ? "Edit caption" : "Add caption"}
            </button>
          )}
          {canVoid && <VoidButton url={`/api/projects/${projectId}/uploads/${photoId}/void`} what="photo" id={photoId} />}
        </div>
      )}
    </div>
  );
}
