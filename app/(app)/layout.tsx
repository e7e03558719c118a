import type { ReactNode } from "react";
import Link from "next/link";
import { requirePageUser } from "@/server/session";
import { env } from "@/env";
import { ROLE_HOME, ROLE_LABELS } from "@/lib/auth/roles";
import { Logo } from "@/components/ui/logo";
import { navItemsFor } from "@/components/shell/nav-items";
import { NavLinks } from "@/components/shell/nav-links";
import { unreadClientMessages } from "@/db/queries/message-reads";
import { NavMenu } from "@/components/shell/nav-menu";
import { SignOutButton } from "@/components/shell/sign-out-button";
import { OfflineSetup } from "@/components/offline/offline-setup";

export default async function AppLayout({ children }: { children: ReactNode }) {
  const user = await requirePageUser();
  const unread = user.role === "lead" ? await unreadClientMessages(user) : 0;
  const items = navItemsFor(user.role, env().TANKWRIGHT_DEV_TOOLS, unread);
  // The lead's longer navigation needs a wide screen to sit in one row; below that it folds into a menu.
  const [inline, folded] = items.length > 4 ? ["hidden xl:flex", "xl:hidden"] : ["hidden md:flex", "md:hidden"];
  return (
    <div className="flex min-h-screen flex-col">
      <header className="no-print sticky top-0 z-30 border-b border-line bg-card/95 backdrop-blur">
        <div className="mx-auto flex max-w-[1600px] items-center gap-4 px-4 py-2">
          <Link href={ROLE_HOME[user.role]} className="flex shrink-0 items-center gap-2 text-accent">
            <Logo className="h-6 w-6" />
            <span className="font-bold tracking-tight">Tankwright</span>
          </Link>
          <NavLinks items={items} className={inline} />
          <div className="ml-auto flex items-center gap-3">
            <span className="hidden text-right text-xs leading-tight sm:block" data-testid="signed-in-as">
              <span className="block font-semibold text-ink">{user.name}</span>
              <span className="text-muted">{ROLE_LABELS[user.role]}</span>
            </span>
            <SignOutButton />
            <NavMenu items={items} className={folded} />
          </div>
        </div>
      </header>
      <main className="mx-auto w-full max-w-[1600px] flex-1 px-4 py-6">
        <OfflineSetup />
        {children}
      </main>
    </div>
  );
}
