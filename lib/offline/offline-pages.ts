/**
 * Which pages a crew member can open again without a signal, once visited, and the words shown when
 * one is a saved copy. Pure, shared by the service worker (sw/service-worker.ts) and the page.
 */

/**
 * Pages kept for offline use, by path. To make another page work offline after a first visit, add
 * one line here; nothing else changes.
 */
export const OFFLINE_PAGES: RegExp[] = [
  /^\/projects\/[^/]+\/install\/?$/,
  /^\/projects\/[^/]+\/service\/visits\/[^/]+\/?$/,
];

export function isOfflinePage(pathname: string): boolean {
  return OFFLINE_PAGES.some((re) => re.test(pathname));
}

/** Saved pages hold one person's view of a project: this cache is emptied at sign-out. */
export const PAGE_CACHE = "tankwright-pages-v1";
/** The app's own built files (scripts, styles, fonts): the same for everyone, named by content hash. */
export const ASSET_CACHE = "tankwright-assets-v1";
export const SAVED_PAGES_LIMIT = 30;
export const SAVED_ASSETS_LIMIT = 400;

/**
 * Built files worth keeping so a saved page can run: Next's hashed bundles and fonts. API answers
 * are never kept: they change, and some belong to one person.
 */
export function isShellAsset(pathname: string): boolean {
  return pathname.startsWith("/_next/static/");
}

/** Messages between the page and the service worker. */
export const SW_MESSAGES = { warm: "tankwright:warm", forget: "tankwright:forget-pages", savedAt: "tankwright:saved-at" } as const;

/** The banner on a page shown from the phone's saved copy. */
export function savedCopyNotice(savedAt: Date, timeZone?: string): string {
  const time = new Intl.DateTimeFormat("en-GB", { hour: "2-digit", minute: "2-digit", hour12: false, timeZone }).format(savedAt);
  return `No signal — showing the page as it was at ${time}. Ticks and photos wait and send when you're back online.`;
}
