import type { Metadata } from "next";
import { requirePageUser } from "@/server/session";
import { listPeople } from "@/db/queries/users";
import { ROLE_LABELS } from "@/lib/auth/roles";
import { InviteForm } from "./_components/invite-form";
import { ResendButton } from "./_components/resend-button";
import { PersonAccess } from "./_components/person-access";

export const metadata: Metadata = { title: "People" };

const INVITE_STATUS: Record<string, { text: string; cls: string }> = {
  waiting: { text: "Invitation waiting to send", cls: "text-caution" },
  sent: { text: "Invitation sent", cls: "text-muted" },
  failed: { text: "Invitation e-mail failed", cls: "text-danger" },
};

export default async function PeoplePage() {
  const me = await requirePageUser("lead");
  const people = await listPeople();
  return (
    <div className="mx-auto flex max-w-4xl flex-col gap-6">
      <h1 className="text-2xl font-bold tracking-tight">People</h1>
      <InviteForm />
      <div className="overflow-x-auto rounded-2xl border border-line bg-card">
        <table className="w-full text-left text-sm">
          <thead className="border-b border-line text-xs uppercase tracking-wide text-muted">
            <tr>
              <th className="px-4 py-2">Name</th>
              <th className="px-4 py-2">Role</th>
              <th className="px-4 py-2">Contact</th>
              <th className="px-4 py-2">Account</th>
              <th className="px-4 py-2">Access</th>
            </tr>
          </thead>
          <tbody>
            {people.map((p) => {
              const st = p.inviteStatus ? INVITE_STATUS[p.inviteStatus] : null;
              return (
                <tr key={p.id} className="border-b border-line last:border-0" data-testid="person-row">
                  <td className="px-4 py-2 font-medium">{p.name}</td>
                  <td className="px-4 py-2">{ROLE_LABELS[p.role]}</td>
                  <td className="px-4 py-2 text-muted">
                    {p.email}
                    {p.phone && <span className="block">{p.phone}</span>}
                  </td>
                  <td className="px-4 py-2">
                    {p.deactivated ? (
                      <span className="text-danger">Deactivated</span>
                    ) : p.active ? (
                      <span className="text-ok">Active</span>
                    ) : (
                      <span className="flex flex-col gap-1">
                        {st && <span className={st.cls}>{st.text}{p.inviteStatus === "failed" && p.inviteError ? `: ${p.inviteError}` : ""}</span>}
                        <ResendButton userId={p.id} />
                      </span>
                    )}
                  </td>
                  <td className="px-4 py-2">
                    {p.id === me.id ? (
                      <span className="text-xs text-muted">You</span>
                    ) : (
                      <PersonAccess userId={p.id} name={p.name} role={p.role} deactivated={p.deactivated} />
                    )}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </div>
  );
}
