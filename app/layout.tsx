import type { Metadata, Viewport } from "next";
import type { ReactNode } from "react";
import { publicSans, jetbrainsMono } from "./fonts";
import { HydrationMark } from "@/components/ui/hydration-mark";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Tankwright", template: "%s · Tankwright" },
  description: "Custom aquarium projects from site survey to a living tank.",
  manifest: "/manifest.webmanifest",
  icons: {
    icon: [
      { url: "/icon.svg", type: "image/svg+xml" },
      { url: "/favicon.ico", sizes: "32x32" },
    ],
    apple: "/apple-touch-icon.png",
  },
};

// Every page depends on who is signed in.
export const dynamic = "force-dynamic";

export const viewport: Viewport = { themeColor: "#0f5e5a", width: "device-width", initialScale: 1 };

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={`${publicSans.variable} ${jetbrainsMono.variable}`}>
      <body className="min-h-screen">
        <HydrationMark />
        {children}
      </body>
    </html>
  );
}
