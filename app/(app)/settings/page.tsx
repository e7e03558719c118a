import type { Metadata } from "next";
import { requirePageUser } from "@/server/session";

export const metadata: Metadata = { title: "Settings" };

export default async function SettingsPage() {
  await requirePageUser("lead");
  return (
    <div className="mx-auto flex max-w-3xl flex-col gap-4">
      <h1 className="text-2xl font-bold tracking-tight">Settings</h1>
      <p className="text-sm text-muted">Company-wide rules live here.</p>
    </div>
  );
}
