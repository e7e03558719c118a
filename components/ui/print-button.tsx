"use client";
import { buttonStyles } from "@/components/ui/button-styles";

/** Opens the browser's print dialog; hidden on the printed page itself. */
export function PrintButton() {
  return (
    <button type="button" className={`${buttonStyles.primary} no-print`} onClick={() => window.print()}>
      Print
    </button>
  );
}
