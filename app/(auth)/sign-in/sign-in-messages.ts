/** What the sign-in page says, shared by the server (429 answers) and the form. */
export const WRONG_CREDENTIALS = "That e-mail and password don't match an account. Check both and try again.";

/** The error code the sign-in callback answers with when attempts are paused; carries the wait in seconds. */
export const THROTTLED_CODE = "TooManyAttempts";

export function throttledMessage(seconds: number | null): string {
  const wait = seconds && seconds > 0 ? (seconds < 90 ? "a minute" : `about ${Math.ceil(seconds / 60)} minutes`) : "a few minutes";
  return `Too many sign-in attempts for this account or from this network. Wait ${wait} and try again; if you've forgotten your password, ask your project lead for a new invitation link.`;
}

/** Reads `TooManyAttempts.<seconds>` back into a message, or null for any other code. */
export function messageForCode(code: string | null | undefined): string | null {
  const m = code?.match(/^TooManyAttempts(?:\.(\d+))?$/);
  return m ? throttledMessage(m[1] ? Number(m[1]) : null) : null;
}
