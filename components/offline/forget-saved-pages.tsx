"use client";
import { useEffect } from "react";
import { forgetSavedPages } from "./saved-pages";

/** On the sign-in pages: whoever signs in next must not find the last person's saved pages. */
export function ForgetSavedPages() {
  useEffect(() => {
    void forgetSavedPages();
  }, []);
  return null;
}
