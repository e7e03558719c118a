import type { Stage } from "@/lib/stages/stages";
import type { MeasureSpec } from "@/lib/install/checklist-progress";

export type DayItem = { id: string; stage: Stage; label: string; hint: string | null; needsPhoto: boolean; measure: MeasureSpec | null };

/** An item's state on the day: the newest tick, or one waiting on this phone (pending). */
export type DayState = {
  done: boolean;
  note: string | null;
  value: number | null;
  attachmentId: string | null;
  byName: string;
  /** Made by the person looking: they may undo it within the undo window. */
  mine?: boolean;
  at: string;
  pending?: boolean;
  /** Held on this phone until the photo it needs has been sent. */
  waitingForPhoto?: boolean;
};

/** What a row hands up: a tick, with the key of a photo still on the phone when it has no id yet. */
export type ItemSubmit = (t: { done: boolean; note: string | null; value: number | null; attachmentId: string | null; photoKey?: string | null }) => void;
