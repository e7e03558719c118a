"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";
import type { NavItem } from "./nav-items";

export function NavLinks({ items, className = "" }: { items: NavItem[]; className?: string }) {
  const pathname = usePathname();
  return (
    <nav aria-label="Main" className={`items-center gap-1 ${className}`}>
      {items.map((item) => {
        const active = pathname === item.href || pathname.startsWith(item.href + "/");
        return (
          <Link
            key={item.href}
            href={item.href}
            aria-current={active ? "page" : undefined}
            className={`whitespace-nowrap rounded-lg px-3 py-1.5 text-sm font-medium ${active ? "bg-accent-soft text-accent-strong" : "text-muted hover:bg-paper hover:text-ink"}`}
          >
            {item.label}
            {item.badge && (
              <span className="ml-1.5 rounded-full bg-accent px-1.5 py-0.5 text-xs font-semibold text-white" data-testid="nav-unread" title={item.badge.label}>
                {item.badge.count}
                <span className="sr-only"> {item.badge.label}</span>
              </span>
            )}
          </Link>
        );
      })}
    </nav>
  );
}
