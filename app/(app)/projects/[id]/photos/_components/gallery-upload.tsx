"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { STAGE_LABELS, STAGES, type Stage } from "@/lib/stages/stages";
import { UploadButton } from "@/components/ui/upload-button";
import { inputStyles } from "@/components/ui/button-styles";

/** Adds a photo or PDF to the gallery. A client's photo is a problem report on the current stage. */
export function GalleryUpload({ projectId, currentStage, isClient }: { projectId: string; currentStage: Stage; isClient: boolean }) {
  const router = useRouter();
  const [stage, setStage] = useState<Stage>(currentStage);
  const [caption, setCaption] = useState("");
  const [done, setDone] = useState<string | null>(null);
  return (
    <section aria-labelledby="add-photo" className="flex flex-col gap-3 rounded-2xl border border-line bg-card p-4 sm:max-w-xl">
      <h2 id="add-photo" className="text-lg font-semibold">
        {isClient ? "Show us a problem" : "Add a photo or document"}
      </h2>
      {!isClient && (
        <div className="flex flex-col gap-1">
          <label htmlFor="photo-stage" className="text-sm font-medium">
            Stage
          </label>
          <select id="photo-stage" className={`${inputStyles} min-h-11`} value={stage} onChange={(e) => setStage(e.target.value as Stage)}>
            {STAGES.map((s) => (
              <option key={s} value={s}>
                {STAGE_LABELS[s]}
              </option>
            ))}
          </select>
        </div>
      )}
      <div className="flex flex-col gap-1">
        <label htmlFor="photo-caption" className="text-sm font-medium">
          {isClient ? "What's wrong? (optional)" : "Caption (optional)"}
        </label>
        <input id="photo-caption" maxLength={300} className={`${inputStyles} min-h-11`} value={caption} onChange={(e) => setCaption(e.target.value)} />
      </div>
      <UploadButton
        projectId={projectId}
        stage={isClient ? currentStage : stage}
        caption={caption || undefined}
        isProblem={isClient}
        photoOnly={isClient}
        label={isClient ? "Choose a photo" : "Choose a photo or PDF"}
        onUploaded={(f) => {
          setDone(`${f.fileName} was added.`);
          setCaption("");
          router.refresh();
        }}
      />
      {done && (
        <p role="status" className="text-sm text-ok">
          {done}
        </p>
      )}
      <p className="text-xs text-muted">JPEG, PNG or WebP photos{isClient ? "" : " and PDF documents"}, up to 15 MB.</p>
    </section>
  );
}
