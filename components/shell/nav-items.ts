import type { Role } from "@/lib/auth/roles";

export type NavItem = { href: string; label: string; /** e.g. unread client messages on the board's cards */ badge?: { count: number; label: string } };

/** The navigation each role sees. The server checks every page again; this only hides links. */
export function navItemsFor(role: Role, devTools: boolean, unreadMessages = 0): NavItem[] {
  if (role === "client") return [{ href: "/portal", label: "Your tanks" }, { href: "/account", label: "Account" }];
  const badge = unreadMessages > 0 ? { count: unreadMessages, label: `${unreadMessages} unread client ${unreadMessages === 1 ? "message" : "messages"}` } : undefined;
  const items: NavItem[] = [{ href: "/board", label: "Installs", badge }, { href: "/due", label: "Due" }];
  if (role === "lead") {
    items.push({ href: "/money", label: "Money" }, { href: "/people", label: "People" }, { href: "/checklists", label: "Checklists" }, { href: "/species", label: "Species" }, { href: "/holding-tanks", label: "Holding tanks" }, { href: "/settings", label: "Settings" }, { href: "/outbox", label: "Mail out" });
    if (devTools) items.push({ href: "/dev/mail", label: "Caught mail" });
  }
  items.push({ href: "/account", label: "Account" });
  return items;
}
