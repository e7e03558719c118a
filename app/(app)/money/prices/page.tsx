import type { Metadata } from "next";
import { requirePageUser } from "@/server/session";
import { getMoneySettings, listPriceItems } from "@/db/queries/money-settings";
import { PriceListEditor } from "../_components/price-list-editor";
import { SettingsForm } from "../_components/settings-form";

export const metadata: Metadata = { title: "Price list" };
export const dynamic = "force-dynamic";

/** The company's currency, default schedule and terms, and the price list quotes are drafted from. Lead only. */
export default async function PricesPage() {
  await requirePageUser("lead");
  const [settings, items] = await Promise.all([getMoneySettings(), listPriceItems({ includeRetired: true })]);
  return (
    <div className="flex flex-col gap-5">
      <h1 className="text-2xl font-bold tracking-tight">Price list and money settings</h1>
      <section className="rounded-2xl border border-line bg-card p-4">
        <h2 className="mb-2 font-semibold">Company settings</h2>
        <SettingsForm settings={{ currency: settings.currency, depositBp: settings.depositBp, progressBp: settings.progressBp, defaultTaxBp: settings.defaultTaxBp, paymentTermsDays: settings.paymentTermsDays }} />
      </section>
      <section className="rounded-2xl border border-line bg-card p-4">
        <h2 className="mb-2 font-semibold">Price list</h2>
        <p className="mb-3 text-sm text-muted">
          Quotes already drafted keep their own prices; a change here applies to the next draft. Items are retired, never deleted.
        </p>
        <PriceListEditor
          currency={settings.currency}
          items={items.map((i) => ({ id: i.id, group: i.group, label: i.label, unit: i.unit, unitPriceMinor: i.unitPriceMinor, taxBp: i.taxBp, basis: i.basis, panelThicknessMm: i.panelThicknessMm, retired: !!i.retiredAt }))}
          defaultTaxBp={settings.defaultTaxBp}
        />
      </section>
    </div>
  );
}
