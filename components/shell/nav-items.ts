import type { Role } from "@/lib/auth/roles";

export type NavItem = { href: string; label: string };

/** The navigation each role sees. The server checks every page again; this only hides links. */
export function navItemsFor(role: Role, devTools: boolean): NavItem[] {
  if (role === "client") return [{ href: "/portal", label: "Your tanks" }, { href: "/account", label: "Account" }];
  const items: NavItem[] = [{ href: "/board", label: "Installs" }];
  if (role === "lead") {
    items.push({ href: "/money", label: "Money" }, { href: "/people", label: "People" }, { href: "/checklists", label: "Checklists" }, { href: "/settings", label: "Settings" }, { href: "/outbox", label: "Mail out" });
    if (devTools) items.push({ href: "/dev/mail", label: "Caught mail" });
  }
  items.push({ href: "/account", label: "Account" });
  return items;
}
