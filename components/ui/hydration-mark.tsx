"use client";
import { useEffect } from "react";
// Loaded on every page through the root layout, before any form parses.
import "./zod-without-eval";

/** Marks the document once React has hydrated, so browser tests act only on a live page. */
export function HydrationMark() {
  useEffect(() => {
    document.documentElement.dataset.hydrated = "true";
  }, []);
  return null;
}
