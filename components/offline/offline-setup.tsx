"use client";
import { useEffect, useRef, useState } from "react";
import { usePathname } from "next/navigation";
import { buttonStyles } from "@/components/ui/button-styles";
import { SW_MESSAGES, isOfflinePage, isShellAsset, savedCopyNotice } from "@/lib/offline/offline-pages";

/** Asks the service worker something and waits briefly for the answer. */
function ask<T>(worker: ServiceWorker, message: unknown): Promise<T | null> {
  return new Promise((resolve) => {
    const channel = new MessageChannel();
    const timer = setTimeout(() => resolve(null), 5000);
    channel.port1.onmessage = (e) => {
      clearTimeout(timer);
      resolve(e.data as T);
    };
    worker.postMessage(message, [channel.port2]);
  });
}

/**
 * Registers the service worker (production builds only: in development it would serve stale code,
 * so any earlier one is removed), has it save the page and its built files when this is a page kept
 * for offline use, and says plainly when the page shown is a saved copy.
 */
export function OfflineSetup() {
  const pathname = usePathname();
  const offlinePage = isOfflinePage(pathname);
  const [savedAt, setSavedAt] = useState<number | null>(null);
  const [online, setOnline] = useState(true);
  const [loadedAt] = useState(() => Date.now());
  const [stale, setStale] = useState(false);
  const savedRef = useRef<number | null>(null);

  useEffect(() => {
    if (!("serviceWorker" in navigator) || process.env.NODE_ENV === "production") return;
    void navigator.serviceWorker.getRegistrations().then((rs) => rs.forEach((r) => void r.unregister()));
  }, []);

  // The worker is registered from the first page kept for offline use that a person opens.
  useEffect(() => {
    if (!offlinePage || !("serviceWorker" in navigator) || process.env.NODE_ENV !== "production") return;
    let live = true;
    void (async () => {
      const controller = navigator.serviceWorker.controller;
      if (controller) {
        const answer = await ask<{ savedAt: number | null }>(controller, { type: SW_MESSAGES.savedAt });
        if (live && answer?.savedAt) {
          savedRef.current = answer.savedAt;
          setSavedAt(answer.savedAt);
        }
      }
      try {
        await navigator.serviceWorker.register("/sw.js", { scope: "/" });
      } catch {
        return; // No worker (an old browser, a blocked origin, no signal): nothing more to save now.
      }
      const ready = await navigator.serviceWorker.ready;
      if (!ready.active || !navigator.onLine) return;
      const assets = performance
        .getEntriesByType("resource")
        .map((e) => e.name)
        .filter((u) => {
          try {
            const url = new URL(u);
            return url.origin === location.origin && isShellAsset(url.pathname);
          } catch {
            return false;
          }
        });
      // Under the worker's control the page itself was saved as it loaded; before that, it asks.
      const urls = controller ? assets : [location.href.split("#")[0], ...assets];
      const done = await ask<{ done: boolean }>(ready.active, { type: SW_MESSAGES.warm, urls });
      if (live && done) document.documentElement.dataset.offlineReady = "true";
    })();
    return () => {
      live = false;
    };
  }, [offlinePage, pathname]);

  useEffect(() => {
    const update = () => setOnline(navigator.onLine);
    const back = () => {
      // A saved copy shown earlier is now known to be old; say so instead of "no signal".
      if (savedRef.current) {
        savedRef.current = null;
        setSavedAt(null);
        setStale(true);
      }
      update();
    };
    update();
    window.addEventListener("online", back);
    window.addEventListener("offline", update);
    return () => {
      window.removeEventListener("online", back);
      window.removeEventListener("offline", update);
    };
  }, []);

  if (!offlinePage) return null;
  if (!online || savedAt) {
    return (
      <p role="status" data-testid="saved-copy" className="mb-4 rounded-xl border border-caution/40 bg-caution-soft px-4 py-3 text-sm font-medium text-ink">
        {savedCopyNotice(new Date(savedAt ?? loadedAt))}
      </p>
    );
  }
  if (stale) {
    return (
      <p role="status" data-testid="back-online" className="mb-4 flex flex-wrap items-center gap-3 rounded-xl border border-line bg-card px-4 py-3 text-sm">
        Back online. This page is the saved copy; reload it to see the latest.
        <button type="button" className={`${buttonStyles.secondary} min-h-11`} onClick={() => location.reload()}>
          Reload
        </button>
      </p>
    );
  }
  return null;
}
