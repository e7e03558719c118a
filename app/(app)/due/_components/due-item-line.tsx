import Link from "next/link";
import type { DueItem } from "@/lib/service/due-list";
import { dayLabel } from "@/lib/service/local-dates";

const TYPE_WORDS: Record<DueItem["type"], string> = { visit: "Visit", service: "Equipment", warranty: "Warranty" };

/** One line of the due list, a link to where the work is recorded; big enough to tap on a phone. */
export function DueItemLine({ item, showDay = false }: { item: DueItem; showDay?: boolean }) {
  return (
    <li data-testid="due-item">
      <Link href={item.href} className="flex flex-col gap-0.5 rounded-xl border border-line bg-card px-4 py-3 hover:border-accent">
        <span className="text-xs font-semibold uppercase tracking-wide text-muted">
          {TYPE_WORDS[item.type]}
          {showDay && ` · ${dayLabel(item.day)}`}
          {item.type === "visit" && item.detail && ` · ${item.detail}`}
        </span>
        <span className="font-semibold">{item.title}</span>
        <span className="text-sm text-muted">
          {item.projectTitle}
          {item.type === "visit" && ` · ${item.assigneeName ?? "not assigned yet"}`}
          {item.type !== "visit" && item.detail && ` · ${item.detail}`}
        </span>
      </Link>
    </li>
  );
}
