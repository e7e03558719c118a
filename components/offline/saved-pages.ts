"use client";
import { PAGE_CACHE } from "@/lib/offline/offline-pages";

/**
 * Empties the saved pages (one person's view of their projects) so the next person on this phone
 * can't open them without a signal. Queued ticks and photos stay: they are unsent work, kept per person.
 */
export async function forgetSavedPages(): Promise<void> {
  try {
    if (typeof caches !== "undefined") await caches.delete(PAGE_CACHE);
  } catch {
    // Storage blocked (a private window): nothing was saved either.
  }
}
