import { describe, expect, it } from "vitest";
import { UNDO_WINDOW_MINUTES, canUndoOwn, undoDeadline } from "@/lib/install/undo-window";

const now = new Date("2026-06-15T10:00:00Z");
const minutesAgo = (m: number) => new Date(now.getTime() - m * 60_000);

describe("undo window", () => {
  it("lets a person take back only their own entry, inside the window", () => {
    expect(canUndoOwn({ byUserId: "a", at: minutesAgo(2) }, "a", now)).toBe(true);
    expect(canUndoOwn({ byUserId: "a", at: minutesAgo(UNDO_WINDOW_MINUTES) }, "a", now)).toBe(true);
    expect(canUndoOwn({ byUserId: "a", at: minutesAgo(UNDO_WINDOW_MINUTES + 0.1) }, "a", now)).toBe(false);
    expect(canUndoOwn({ byUserId: "b", at: minutesAgo(1) }, "a", now)).toBe(false);
  });
  it("ends the window ten minutes after the entry", () => {
    expect(undoDeadline(minutesAgo(0)).toISOString()).toBe("2026-06-15T10:10:00.000Z");
  });
});
