"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";

export type ProjectTab = { href: string; label: string };

export function ProjectTabs({ tabs }: { tabs: ProjectTab[] }) {
  const pathname = usePathname();
  return (
    <nav aria-label="Project sections" className="no-print -mb-px flex flex-wrap gap-x-1 border-b border-line">
      {tabs.map((t) => {
        const active = pathname === t.href;
        return (
          <Link
            key={t.href}
            href={t.href}
            aria-current={active ? "page" : undefined}
            className={`whitespace-nowrap border-b-2 px-3 py-2 text-sm font-medium ${active ? "border-accent text-accent-strong" : "border-transparent text-muted hover:text-ink"}`}
          >
            {t.label}
          </Link>
        );
      })}
    </nav>
  );
}
