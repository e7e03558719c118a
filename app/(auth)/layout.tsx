import type { ReactNode } from "react";
import Link from "next/link";
import { Logo } from "@/components/ui/logo";
import { ForgetSavedPages } from "@/components/offline/forget-saved-pages";

export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <main className="flex min-h-screen items-center justify-center px-4 py-12">
      <ForgetSavedPages />
      <div className="w-full max-w-sm">
        <Link href="/" className="mb-6 flex items-center justify-center gap-2 text-accent">
          <Logo />
          <span className="text-xl font-bold tracking-tight">Tankwright</span>
        </Link>
        <div className="rounded-2xl border border-line bg-card p-6 shadow-sm">{children}</div>
      </div>
    </main>
  );
}
