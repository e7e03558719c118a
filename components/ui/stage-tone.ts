import type { Stage } from "@/lib/stages/stages";

/**
 * Tailwind classes for each stage's tone (see the theme in app/globals.css). `text` is the dark ink
 * of the tone, for words and small marks; `fill` is the plain tone, for shapes only.
 */
export const STAGE_TONE: Record<Stage, { text: string; fill: string; bg: string; soft: string; border: string }> = {
  site_survey: { text: "text-stage-survey-ink", fill: "text-stage-survey", bg: "bg-stage-survey", soft: "bg-stage-survey-soft", border: "border-stage-survey" },
  stand_load_check: { text: "text-stage-load-ink", fill: "text-stage-load", bg: "bg-stage-load", soft: "bg-stage-load-soft", border: "border-stage-load" },
  aquascape: { text: "text-stage-scape-ink", fill: "text-stage-scape", bg: "bg-stage-scape", soft: "bg-stage-scape-soft", border: "border-stage-scape" },
  fill_leak_test: { text: "text-stage-fill-ink", fill: "text-stage-fill", bg: "bg-stage-fill", soft: "bg-stage-fill-soft", border: "border-stage-fill" },
  cycling: { text: "text-stage-cycling-ink", fill: "text-stage-cycling", bg: "bg-stage-cycling", soft: "bg-stage-cycling-soft", border: "border-stage-cycling" },
  first_stocking: { text: "text-stage-stocking-ink", fill: "text-stage-stocking", bg: "bg-stage-stocking", soft: "bg-stage-stocking-soft", border: "border-stage-stocking" },
  in_service: { text: "text-stage-service-ink", fill: "text-stage-service", bg: "bg-stage-service", soft: "bg-stage-service-soft", border: "border-stage-service" },
};
