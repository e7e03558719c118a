"use client";
import { buttonStyles } from "@/components/ui/button-styles";

export function PrintButton() {
  return (
    <button type="button" className={`${buttonStyles.primary} no-print`} onClick={() => window.print()}>
      Print
    </button>
  );
}
