"use client";
import { useEffect, useId, useRef, useState } from "react";
import Link from "next/link";
import { usePathname } from "next/navigation";
import type { NavItem } from "./nav-items";

/**
 * The navigation folded behind one button on narrow screens, so no link is cut off or scrolled away.
 * A plain disclosure: the button says whether it is open, Escape closes it and gives focus back.
 */
export function NavMenu({ items, className = "" }: { items: NavItem[]; className?: string }) {
  const [open, setOpen] = useState(false);
  const pathname = usePathname();
  const panelId = useId();
  const button = useRef<HTMLButtonElement>(null);
  const unread = items.reduce((n, i) => n + (i.badge?.count ?? 0), 0);

  useEffect(() => {
    if (!open) return;
    const onKey = (e: KeyboardEvent) => {
      if (e.key !== "Escape") return;
      setOpen(false);
      button.current?.focus();
    };
    document.addEventListener("keydown", onKey);
    return () => document.removeEventListener("keydown", onKey);
  }, [open]);

  return (
    <div className={`relative ${className}`}>
      <button
        ref={button}
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpen((o) => !o)}
        className="flex items-center gap-1.5 whitespace-nowrap rounded-lg border border-line px-3 py-1.5 text-sm font-medium text-ink hover:bg-paper"
      >
        <svg aria-hidden="true" viewBox="0 0 16 16" className="h-4 w-4" fill="none" stroke="currentColor" strokeWidth="1.75" strokeLinecap="round">
          {open ? <path d="M4 4l8 8M12 4l-8 8" /> : <path d="M2.5 4h11M2.5 8h11M2.5 12h11" />}
        </svg>
        Menu
        {unread > 0 && !open && (
          <span className="rounded-full bg-accent px-1.5 py-0.5 text-xs font-semibold text-white">
            {unread}
            <span className="sr-only"> unread</span>
          </span>
        )}
      </button>
      <nav id={panelId} aria-label="Main" hidden={!open} className="absolute right-0 top-full z-40 mt-2 w-64 max-w-[calc(100vw-2rem)] rounded-xl border border-line bg-card p-2 shadow-lg">
        <ul className="flex flex-col">
          {items.map((item) => {
            const active = pathname === item.href || pathname.startsWith(item.href + "/");
            return (
              <li key={item.href}>
                <Link
                  href={item.href}
                  aria-current={active ? "page" : undefined}
                  onClick={() => setOpen(false)}
                  className={`flex items-center justify-between rounded-lg px-3 py-2 text-sm font-medium ${active ? "bg-accent-soft text-accent-strong" : "text-ink hover:bg-paper"}`}
                >
                  {item.label}
                  {item.badge && (
                    <span className="rounded-full bg-accent px-1.5 py-0.5 text-xs font-semibold text-white" title={item.badge.label}>
                      {item.badge.count}
                      <span className="sr-only"> {item.badge.label}</span>
                    </span>
                  )}
                </Link>
              </li>
            );
          })}
        </ul>
      </nav>
    </div>
  );
}
