"use client";
import { useCallback, useEffect, useRef } from "react";
import { retryDelayMs } from "@/lib/install/tick-queue";

/**
 * Runs a device-side queue's sender one pass at a time. A pass that stops on a failure is tried
 * again with backoff, and at once when the browser says it is back online. Returns "send now".
 * `sendAll` sends what is queued and says whether the queue emptied (false: try again later).
 */
export function useSendLoop(sendAll: () => Promise<boolean>) {
  const sendRef = useRef(sendAll);
  useEffect(() => {
    sendRef.current = sendAll;
  });
  const sending = useRef(false);
  const attempt = useRef(0);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);

  const run = useCallback(async function pass(): Promise<void> {
    if (sending.current) return;
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
    sending.current = true;
    let emptied = true;
    try {
      emptied = await sendRef.current();
    } finally {
      sending.current = false;
    }
    if (emptied) attempt.current = 0;
    else timer.current = setTimeout(() => void pass(), retryDelayMs(attempt.current++));
  }, []);

  const sendNow = useCallback(() => {
    attempt.current = 0;
    void run();
  }, [run]);

  useEffect(() => {
    window.addEventListener("online", sendNow);
    return () => {
      window.removeEventListener("online", sendNow);
      if (timer.current) clearTimeout(timer.current);
    };
  }, [sendNow]);

  return sendNow;
}
