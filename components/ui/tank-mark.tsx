import { stageIndex, type Stage } from "@/lib/stages/stages";

/**
 * The water line: a tank's cross-section as it stands at a stage. The picture builds up stage by
 * stage (a dry outline being measured, then on its stand, rock and sand, water, a shimmer while the
 * biology works, a fish, plants and fish), so a row of them reads as the water rising.
 * Drawn in currentColor; `dim` draws a stage still to come as a faint dashed outline.
 */
export function TankMark({ stage, className = "h-6 w-8", dim = false }: { stage: Stage; className?: string; dim?: boolean }) {
  const at = stageIndex(stage);
  const has = (s: Stage) => at >= stageIndex(s);
  return (
    <svg viewBox="0 0 32 24" className={className} fill="none" stroke="currentColor" strokeWidth={1.4} strokeLinecap="round" strokeLinejoin="round" aria-hidden="true">
      {has("fill_leak_test") && !dim && <path d="M4 7.5 H28 V17 H4 Z" fill="currentColor" fillOpacity={0.22} stroke="none" />}
      {has("aquascape") && !dim && <path d="M4 17 V14.5 Q8 13 11 14 L13 11.5 L16 12.5 L17 14 Q22 13 28 14.5 V17 Z" fill="currentColor" fillOpacity={0.45} stroke="none" />}
      {has("fill_leak_test") && !dim && <path d="M4 7.5 Q7 6.5 10 7.5 T16 7.5 T22 7.5 T28 7.5" />}
      {stage === "cycling" && !dim && <path d="M9 12 v-0.1 M13 10 v-0.1 M21 11 v-0.1 M24 9.5 v-0.1" strokeWidth={1.8} />}
      {has("first_stocking") && !dim && <path d="M15 10.5 C17 8.8 20 8.8 21.5 10.5 C20 12.2 17 12.2 15 10.5 Z M15 10.5 L13.4 9.2 M15 10.5 L13.4 11.8" />}
      {stage === "in_service" && !dim && <path d="M8 14.5 C7 12 9 11 8 9 M10 14 C11 12 9.5 11 10.5 9.5 M25 14.5 C24 12.5 26 11.5 25 10" />}
      <path d="M4 3 V17 H28 V3" strokeDasharray={dim || stage === "site_survey" ? "2 2" : undefined} />
      {stage === "site_survey" && !dim && <path d="M4 1 H28 M4 0 V2 M28 0 V2" strokeWidth={1} />}
      {has("stand_load_check") && !dim && <path d="M3 19.5 H29 M6 19.5 V23 M26 19.5 V23 M16 19.5 V23" />}
    </svg>
  );
}
