import localFont from "next/font/local";

// Shipped with the app: nothing is fetched from a font service at build or run time.
export const publicSans = localFont({
  src: [{ path: "./fonts/public-sans-latin-wght.woff2", weight: "100 900", style: "normal" }],
  variable: "--font-public-sans",
  display: "swap",
});

export const jetbrainsMono = localFont({
  src: [{ path: "./fonts/jetbrains-mono-latin-wght.woff2", weight: "100 800", style: "normal" }],
  variable: "--font-jetbrains-mono",
  display: "swap",
  // Figures only (counts, readings): not preloaded, so its 40 kB don't compete with the page's
  // text, styles and scripts on a slow first load; the figures swap in when it arrives.
  preload: false,
});
