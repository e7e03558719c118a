import { z } from "zod";

export const prefsSchema = z.object({
  stage_change: z.boolean().optional(),
  cycle_ready: z.boolean().optional(),
  shared_note: z.boolean().optional(),
  message: z.boolean().optional(),
  visit_report: z.boolean().optional(),
});

export type PrefsInput = z.infer<typeof prefsSchema>;

export const PREF_LABELS: Record<keyof PrefsInput, { label: string; hint: string }> = {
  stage_change: { label: "Stage changes", hint: "When a project moves to its next stage, or back." },
  cycle_ready: { label: "Tank ready for fish", hint: "When the water tests show a tank has finished cycling." },
  shared_note: { label: "Shared notes", hint: "When the project lead shares a note with the client." },
  message: { label: "Messages", hint: "When someone writes to you on a project." },
  visit_report: { label: "Visit reports", hint: "When a service visit to your tank is signed off." },
};
