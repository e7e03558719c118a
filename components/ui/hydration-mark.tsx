"use client";
import { useEffect } from "react";

/** Marks the document once React has hydrated, so browser tests act only on a live page. */
export function HydrationMark() {
  useEffect(() => {
    document.documentElement.dataset.hydrated = "true";
  }, []);
  return null;
}
