/** Class strings for buttons and button-like links, so links and buttons look the same. */
export const buttonStyles = {
  primary: "inline-flex items-center justify-center gap-2 rounded-lg bg-accent px-4 py-2 text-sm font-semibold text-white hover:bg-accent-strong disabled:opacity-50",
  secondary: "inline-flex items-center justify-center gap-2 rounded-lg border border-line bg-card px-4 py-2 text-sm font-semibold text-ink hover:bg-paper disabled:opacity-50",
  danger: "inline-flex items-center justify-center gap-2 rounded-lg bg-danger px-4 py-2 text-sm font-semibold text-white hover:opacity-90 disabled:opacity-50",
  quiet: "inline-flex items-center gap-1 text-sm font-semibold text-accent hover:underline",
};

export const inputStyles =
  "w-full rounded-lg border border-line bg-card px-3 py-2 text-sm text-ink placeholder:text-muted/70 focus:border-accent aria-[invalid=true]:border-danger";
