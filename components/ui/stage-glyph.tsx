import type { Stage } from "@/lib/stages/stages";

/** A small mark of our own for each stage, so colour is never the only signal. */
const PATHS: Record<Stage, string> = {
  // A set square: measuring the site.
  site_survey: "M3 13 L3 3 L13 13 Z M5.5 10.5 L5.5 8",
  // A weight pressing on a beam.
  stand_load_check: "M5 3 h6 l1.5 6 h-9 Z M2 12 h12 M8 9 v3",
  // A stacked stone.
  aquascape: "M3 13 L5 8 L9 7 L13 10 L12 13 Z M6 7 L8 3.5 L10.5 6.5",
  // A drop.
  fill_leak_test: "M8 2.5 C10.5 6 12 8 12 10 a4 4 0 0 1 -8 0 C4 8 5.5 6 8 2.5 Z",
  // Two arrows chasing each other: the cycle.
  cycling: "M12.5 6 A5 5 0 0 0 4 5 M4 5 V2.5 M4 5 H6.5 M3.5 10 A5 5 0 0 0 12 11 M12 11 V13.5 M12 11 H9.5",
  // A fish.
  first_stocking: "M2.5 8 C5 4.5 9.5 4.5 12 8 C9.5 11.5 5 11.5 2.5 8 Z M12 8 L14.5 5.5 M12 8 L14.5 10.5",
  // A wave under a tick.
  in_service: "M2 12 q1.5 -1.5 3 0 t3 0 t3 0 t3 0 M5 6.5 L7 8.5 L11 4",
};

export function StageGlyph({ stage, className = "h-4 w-4" }: { stage: Stage; className?: string }) {
  return (
    <svg viewBox="0 0 16 16" className={className} fill="none" stroke="currentColor" strokeWidth={1.5} strokeLinecap="round" strokeLinejoin="round" aria-hidden="true">
      <path d={PATHS[stage]} />
    </svg>
  );
}
