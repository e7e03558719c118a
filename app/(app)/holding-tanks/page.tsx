import type { Metadata } from "next";
import { requirePageUser } from "@/server/session";
import { listHoldingTanks } from "@/db/queries/holding-tanks";
import { getHoldingTankOccupants } from "@/db/queries/holding-occupants";
import { HoldingTankForm } from "./_components/holding-tank-form";

export const metadata: Metadata = { title: "Holding tanks" };

/** The company's holding tanks, for quarantine and for fish taken out of a display; the lead manages them. */
export default async function HoldingTanksPage() {
  await requirePageUser("lead");
  const [tanks, occupants] = await Promise.all([listHoldingTanks(), getHoldingTankOccupants()]);
  return (
    <div className="mx-auto flex max-w-3xl flex-col gap-6">
      <div>
        <h1 className="text-2xl font-bold tracking-tight">Holding tanks</h1>
        <p className="text-sm text-muted">New fish wait here through quarantine; fish taken out of a display stay here until they go back or are rehomed.</p>
      </div>
      {tanks.length === 0 ? (
        <p className="text-sm text-muted">No holding tanks yet.</p>
      ) : (
        <ul className="flex flex-col gap-2">
          {tanks.map((t) => {
            const here = occupants.filter((o) => o.holdingTankId === t.id);
            return (
              <li key={t.id} className="rounded-xl border border-line bg-card p-4 text-sm">
                <p className="font-semibold">
                  {t.name} <span className="num font-normal text-muted">· {Math.round(t.volumeL)} L · {t.location}</span>
                </p>
                {here.length === 0 ? (
                  <p className="text-muted">Empty.</p>
                ) : (
                  <ul>
                    {here.map((o) => (
                      <li key={o.key}>{o.text}</li>
                    ))}
                  </ul>
                )}
              </li>
            );
          })}
        </ul>
      )}
      <HoldingTankForm />
    </div>
  );
}
