import type { Stage } from "@/lib/stages/stages";
import type { MeasureSpec } from "@/lib/install/checklist-progress";

export type TemplateItem = { id: string; stage: Stage; label: string; hint: string | null; position: string; needsPhoto: boolean; measure: MeasureSpec | null; retiredAt: string | null };
